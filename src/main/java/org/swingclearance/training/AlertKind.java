package org.swingclearance.training;

/** Why an alert was raised; labels in the training bundle as {@code AlertKind.CONSTANT}. */
public enum AlertKind {
    /** Pain during the session above the practice rule's limit. */
    PAIN_DURING,
    /** Pain the next morning not settled back to the pain at rest before the session. */
    PAIN_NOT_SETTLED,
    /** The weekly mean pain rose from the week before. */
    PAIN_RISING_WEEKLY,
    /** A heavier configuration than the current plan step (more mass, longer lever or faster cycle). */
    HEAVIER_THAN_STEP,
    /** Acute:chronic load ratio above the rule's caution level (a monitoring signal, never a clearance). */
    LOAD_RATIO
}
