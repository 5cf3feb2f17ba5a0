package org.swingclearance.engine.mechanics;

import org.swingclearance.engine.rules.LoadBand;

/**
 * The practice rules a configuration is judged by (engine.md §5). The clinic's rules set the values; the defaults
 * here are the engine's.
 *
 * @param bandFraction        f in [0, 1]: the share of shoulder capacity permitted (C1, C2)
 * @param gripFraction        f_grip in [0, 1] for C3, or null to use f
 * @param controlledStop      whether C2 applies: the patient must be able to stop the club anywhere in the arc
 * @param rangeMarginRad      margin below the measured shoulder flexion range for C4, rad, in [0, π/2]
 * @param hipDriveMinimumBand lowest lumbopelvic band that allows hip-driven patterns (C5); never null
 */
public record LoadRules(double bandFraction, Double gripFraction, boolean controlledStop, double rangeMarginRad,
                        LoadBand hipDriveMinimumBand) {

    /** Default margin below the measured range, 10° (common practice, no source). */
    public static final double DEFAULT_RANGE_MARGIN_DEG = 10.0;

    public LoadRules {
        Checks.inRange("band fraction", bandFraction, 0.0, 1.0);
        if (gripFraction != null) {
            Checks.inRange("grip fraction", gripFraction, 0.0, 1.0);
        }
        Checks.inRange("range margin (rad)", rangeMarginRad, 0.0, Math.PI / 2.0);
        Checks.present("minimum lumbopelvic band for hip-driven patterns", hipDriveMinimumBand);
    }

    /** Engine defaults for a band fraction: f_grip = f, controlled stop on, 10° margin, hip drive from Band 2. */
    public static LoadRules forFraction(double bandFraction) {
        return new LoadRules(bandFraction, null, true, Math.toRadians(DEFAULT_RANGE_MARGIN_DEG), LoadBand.BAND_2);
    }

    /** Engine defaults for a band at its default fraction. */
    public static LoadRules forBand(LoadBand band) {
        return forFraction(band.defaultFraction());
    }

    /** f_grip: the grip fraction, or f when none is set. */
    public double effectiveGripFraction() {
        return gripFraction != null ? gripFraction : bandFraction;
    }

    /** These rules with another band fraction. */
    public LoadRules withBandFraction(double fraction) {
        return new LoadRules(fraction, gripFraction, controlledStop, rangeMarginRad, hipDriveMinimumBand);
    }

    /** These rules with the controlled-stop rule (C2) on or off. */
    public LoadRules withControlledStop(boolean on) {
        return new LoadRules(bandFraction, gripFraction, on, rangeMarginRad, hipDriveMinimumBand);
    }
}
