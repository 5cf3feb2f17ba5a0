package org.swingclearance.engine.scoring;

import java.util.Objects;
import java.util.Optional;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Citations;

/**
 * Grip-strength reference values: the Mathiowetz 1985 table (mean of three trials, converted from lb) and the
 * EWGSOP2 low-grip cut-offs (clinical.md §2.4). Compare like with like: Mathiowetz norms are means of three trials.
 */
public final class GripNorms {

    /**
     * One row of a reference table.
     *
     * @param ageBand  the table's age band, e.g. "25–29"
     * @param meanKg   mean grip in kg
     * @param sdKg     standard deviation in kg
     * @param citation source of the row
     */
    public record Norm(String ageBand, double meanKg, double sdKg, Citation citation) {
        public Norm {
            Objects.requireNonNull(ageBand, "ageBand");
            Objects.requireNonNull(citation, "citation");
        }
    }

    private static final int[] BAND_START = {20, 25, 30, 35, 40, 45, 50, 55, 60, 65, 70, 75};
    private static final String[] BAND_LABEL = {"20–24", "25–29", "30–34", "35–39", "40–44", "45–49", "50–54",
            "55–59", "60–64", "65–69", "70–74", "75+"};
    // Mathiowetz et al. 1985, lb: {right mean, right SD, left mean, left SD} per age band.
    private static final double[][] MEN_LB = {
            {121.0, 20.6, 104.5, 21.8}, {120.8, 23.0, 110.5, 16.2}, {121.8, 22.4, 110.4, 21.7},
            {119.7, 24.0, 112.9, 21.7}, {116.8, 20.7, 112.8, 18.7}, {109.9, 23.0, 100.8, 22.8},
            {113.6, 18.1, 101.9, 17.0}, {101.1, 26.7, 83.2, 23.4}, {89.7, 20.4, 76.8, 20.3},
            {91.1, 20.6, 76.8, 19.8}, {75.3, 21.5, 64.8, 18.1}, {65.7, 21.0, 55.0, 17.0}};
    private static final double[][] WOMEN_LB = {
            {70.4, 14.5, 61.0, 13.1}, {74.5, 13.9, 63.5, 12.2}, {78.7, 19.2, 68.0, 17.7},
            {74.1, 10.8, 66.3, 11.7}, {70.4, 13.5, 62.3, 13.8}, {62.2, 15.1, 56.0, 12.7},
            {65.8, 11.6, 57.3, 10.7}, {57.3, 12.5, 47.3, 11.9}, {55.1, 10.1, 45.7, 10.1},
            {49.6, 9.7, 41.0, 8.2}, {49.6, 11.7, 41.5, 10.2}, {42.6, 11.0, 37.6, 8.9}};

    private GripNorms() {
    }

    /**
     * Mathiowetz 1985 norm for a hand.
     *
     * @param sex      never null
     * @param ageYears age in whole years
     * @param hand     right or left hand (the table is by hand, most subjects right-handed); never null
     * @return the row in kg, empty below 20 years (the table starts at 20)
     */
    public static Optional<Norm> mathiowetz(Sex sex, int ageYears, Side hand) {
        Objects.requireNonNull(sex, "sex");
        Objects.requireNonNull(hand, "hand");
        if (ageYears < BAND_START[0]) {
            return Optional.empty();
        }
        int band = BAND_START.length - 1;
        while (BAND_START[band] > ageYears) {
            band--;
        }
        double[] row = (sex == Sex.MALE ? MEN_LB : WOMEN_LB)[band];
        int column = hand == Side.RIGHT ? 0 : 2;
        return Optional.of(new Norm(BAND_LABEL[band], Grip.poundsToKilograms(row[column]),
                Grip.poundsToKilograms(row[column + 1]), Citations.MATHIOWETZ_1985));
    }

    /** Grip as a percentage of the norm's mean; {@code gripKg} ≥ 0. */
    public static double percentOfNorm(double gripKg, Norm norm) {
        return Inputs.nonNegative(gripKg, "grip") / norm.meanKg() * 100;
    }

    /** Standard score against the norm: (grip − mean) ÷ SD. */
    public static double zScore(double gripKg, Norm norm) {
        return (Inputs.nonNegative(gripKg, "grip") - norm.meanKg()) / norm.sdKg();
    }

    /** EWGSOP2 low grip: below 27 kg for men, below 16 kg for women (numbers from memory, clinical.md §2.4). */
    public static boolean lowGripEwgsop2(Sex sex, double gripKg) {
        Objects.requireNonNull(sex, "sex");
        return Inputs.nonNegative(gripKg, "grip") < (sex == Sex.MALE ? 27 : 16);
    }

    /** Source of {@link #lowGripEwgsop2}. */
    public static Citation ewgsop2Citation() {
        return Citations.EWGSOP2_GRIP;
    }
}
