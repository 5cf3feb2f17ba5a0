package org.swingclearance.plan;

/** Sets × reps and the session effort cap on the CR-10 scale (Foster 2001) for steps in one band. */
public record Dose(int sets, int reps, int effortCap) {

    public static final int MAX_SETS = 20;
    public static final int MAX_REPS = 200;
    public static final int MAX_EFFORT = 10;

    public Dose {
        if (sets < 1 || sets > MAX_SETS || reps < 1 || reps > MAX_REPS || effortCap < 0 || effortCap > MAX_EFFORT) {
            throw new IllegalArgumentException("dose out of range: " + sets + " x " + reps + " @ " + effortCap);
        }
    }
}
