package org.swingclearance.patient;

/** Whether an episode is still being worked on. */
public enum EpisodeStatus { ACTIVE, CLOSED }
