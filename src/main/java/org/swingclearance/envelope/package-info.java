/**
 * The patient's permitted envelope: for the latest signed screening of an episode, every club in service × swing
 * pattern judged by the mechanics engine (permitted, demand ratio, binding constraint, furthest grip from the head,
 * shortest cycle time, heaviest mass of the club's shape, range-of-motion exclusions), stored as an append-only
 * snapshot with its inputs, engine version and practice-rules version, and reused while nothing changed. Other
 * features read it through {@link org.swingclearance.envelope.Envelopes} (Contract E). No physics here: every
 * number comes from {@code org.swingclearance.engine}.
 */
package org.swingclearance.envelope;
