package org.swingclearance.rules;

/**
 * What a graded-plan step in a band starts from unless the clinician changes it (common practice, no source).
 *
 * @param sets      sets per session, 1–20
 * @param reps      swings per set, 1–200
 * @param effortCap highest session effort allowed (CR-10 RPE), 0–10
 */
public record BandPlanDefaults(int sets, int reps, int effortCap) {

    public BandPlanDefaults {
        if (sets < 1 || sets > 20 || reps < 1 || reps > 200 || effortCap < 0 || effortCap > 10) {
            throw new IllegalArgumentException("plan defaults out of range: " + sets + "×" + reps + " RPE " + effortCap);
        }
    }
}
