package org.swingclearance.engine.plan;

/**
 * How much to do at one plan step: sets × reps (swings per set) and the cap on session effort on the CR-10 session
 * RPE scale (Foster 2001). The values are per-band defaults from the clinic's practice rules.
 */
public record Dosage(int sets, int reps, int effortCap) {

    public Dosage {
        if (sets < 1 || reps < 1) {
            throw new IllegalArgumentException("Sets and reps must be at least 1, were " + sets + " × " + reps);
        }
        if (effortCap < 0 || effortCap > 10) {
            throw new IllegalArgumentException("Effort cap is on the 0–10 scale, was " + effortCap);
        }
    }
}
