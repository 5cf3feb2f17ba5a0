package org.swingclearance.engine.mechanics;

import org.swingclearance.engine.rules.LoadBand;

/**
 * What the patient measured (engine.md §5). Without a measured shoulder flexion torque there is no capacity: the
 * caller reports demand only and asks for that measurement ({@link #MEASURE_SHOULDER_TORQUE}).
 *
 * @param shoulderFlexionTorqueNm isometric shoulder flexion torque τ_cap (dynamometer force × lever arm, arm at
 *                                90° flexion; involved side for one-hand patterns, weaker side for two-hand
 *                                patterns), N·m, in (0, {@value #MAX_TORQUE_NM}]
 * @param gripStrengthKg          grip strength G, kg, in (0, {@value #MAX_GRIP_KG}], or null when not measured
 *                                (grip pull is then not checked and the result says so)
 * @param shoulderFlexionRangeRad active shoulder flexion range, rad, in [0, π], or null when not measured (the
 *                                arc is then not checked against it and the result says so)
 * @param lumbopelvicBand         the patient's lumbopelvic load band, or null when not screened (hip-driven
 *                                patterns are then excluded)
 */
public record Capacity(double shoulderFlexionTorqueNm, Double gripStrengthKg, Double shoulderFlexionRangeRad,
                       LoadBand lumbopelvicBand) {

    public static final double MAX_TORQUE_NM = 500.0;
    public static final double MAX_GRIP_KG = 150.0;
    /** What to tell the clinician when no shoulder torque was measured. */
    public static final String MEASURE_SHOULDER_TORQUE = "Measure isometric shoulder flexion torque (dynamometer"
            + " force × lever arm, arm at 90° flexion) to compute limits; only the demand is shown.";

    public Capacity {
        Checks.aboveAtMost("shoulder flexion torque (N·m)", shoulderFlexionTorqueNm, 0.0, MAX_TORQUE_NM);
        if (gripStrengthKg != null) {
            Checks.aboveAtMost("grip strength (kg)", gripStrengthKg, 0.0, MAX_GRIP_KG);
        }
        if (shoulderFlexionRangeRad != null) {
            Checks.inRange("shoulder flexion range (rad)", shoulderFlexionRangeRad, 0.0, Math.PI);
        }
    }

    /** Shoulder torque and grip only (no range of motion, no lumbopelvic band). */
    public static Capacity of(double shoulderFlexionTorqueNm, Double gripStrengthKg) {
        return new Capacity(shoulderFlexionTorqueNm, gripStrengthKg, null, null);
    }

    /** This capacity with a shoulder flexion range given in degrees, [0, 180]. */
    public Capacity withShoulderFlexionRangeDeg(double degrees) {
        Checks.inRange("shoulder flexion range (°)", degrees, 0.0, 180.0);
        return new Capacity(shoulderFlexionTorqueNm, gripStrengthKg, Math.toRadians(degrees), lumbopelvicBand);
    }

    /** This capacity with the patient's lumbopelvic band. */
    public Capacity withLumbopelvicBand(LoadBand band) {
        return new Capacity(shoulderFlexionTorqueNm, gripStrengthKg, shoulderFlexionRangeRad, band);
    }
}
