/**
 * Swing Clearance: screening, limits and graded return-to-swinging plans for heavy-club training.
 * One package per feature (identity, patient, screening, rules, equipment, plan, training, audit) with a
 * {@code web} sub-package each, a pure {@code engine} package, and {@code web} for what the features share.
 */
package org.swingclearance;
