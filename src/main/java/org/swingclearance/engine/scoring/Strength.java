package org.swingclearance.engine.scoring;

import java.util.List;
import org.swingclearance.engine.evidence.Citations;

/** Hand-held dynamometer conversions (clinical.md §2.2–2.3): torque, force per kilogram, % body weight, ER:IR ratio. */
public final class Strength {

    /** Standard gravity in m/s², exact by definition. */
    public static final double STANDARD_GRAVITY = 9.80665;

    private Strength() {
    }

    /**
     * Torque = force × lever arm.
     *
     * @param forceNewtons    dynamometer force in N, ≥ 0; null = not tested
     * @param leverArmMetres  distance from the dynamometer pad to the joint axis in m, &gt; 0; null = not measured
     * @return torque in {@link Unit#NEWTON_METRE}; not scorable when an input is missing
     * @throws IllegalArgumentException when the force is negative or the lever arm is not positive
     */
    public static Score torque(Double forceNewtons, Double leverArmMetres) {
        List<String> missing = Inputs.missing("force", forceNewtons, "lever arm", leverArmMetres);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.NEWTON_METRE, Citations.TORQUE,
                    Inputs.notTestedRule("torque needs force and lever arm", missing));
        }
        Inputs.nonNegative(forceNewtons, "force");
        Inputs.positive(leverArmMetres, "lever arm");
        return Score.of(forceNewtons * leverArmMetres, Unit.NEWTON_METRE, Citations.TORQUE);
    }

    /**
     * Force normalised to body mass.
     *
     * @param forceNewtons force in N, ≥ 0; null = not tested
     * @param bodyMassKg   body mass in kg, &gt; 0; null = not measured
     * @return force per kilogram in {@link Unit#NEWTON_PER_KILOGRAM}
     */
    public static Score forcePerKilogram(Double forceNewtons, Double bodyMassKg) {
        List<String> missing = Inputs.missing("force", forceNewtons, "body mass", bodyMassKg);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.NEWTON_PER_KILOGRAM, Citations.TORQUE,
                    Inputs.notTestedRule("force per kilogram needs force and body mass", missing));
        }
        Inputs.nonNegative(forceNewtons, "force");
        Inputs.positive(bodyMassKg, "body mass");
        return Score.of(forceNewtons / bodyMassKg, Unit.NEWTON_PER_KILOGRAM, Citations.TORQUE);
    }

    /**
     * Force as a percentage of body weight = force ÷ (mass × 9.80665) × 100.
     *
     * @param forceNewtons force in N, ≥ 0; null = not tested
     * @param bodyMassKg   body mass in kg, &gt; 0; null = not measured
     * @return % body weight in {@link Unit#PERCENT}
     */
    public static Score percentBodyWeight(Double forceNewtons, Double bodyMassKg) {
        List<String> missing = Inputs.missing("force", forceNewtons, "body mass", bodyMassKg);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.PERCENT, Citations.TORQUE,
                    Inputs.notTestedRule("% body weight needs force and body mass", missing));
        }
        Inputs.nonNegative(forceNewtons, "force");
        Inputs.positive(bodyMassKg, "body mass");
        return Score.of(forceNewtons / (bodyMassKg * STANDARD_GRAVITY) * 100, Unit.PERCENT, Citations.TORQUE);
    }

    /**
     * External-to-internal rotation ratio = ER force ÷ IR force, same position and session (Riemann 2010 reports it
     * for forces at equal lever arms).
     *
     * @param externalRotationNewtons ER force in N, ≥ 0; null = not tested
     * @param internalRotationNewtons IR force in N, ≥ 0; null = not tested
     * @return the ratio in {@link Unit#RATIO}; not scorable when missing or when IR force is 0
     */
    public static Score externalInternalRatio(Double externalRotationNewtons, Double internalRotationNewtons) {
        List<String> missing = Inputs.missing("ER force", externalRotationNewtons, "IR force",
                internalRotationNewtons);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.RATIO, Citations.RIEMANN_2010,
                    Inputs.notTestedRule("ER:IR ratio needs ER and IR force", missing));
        }
        Inputs.nonNegative(externalRotationNewtons, "ER force");
        Inputs.nonNegative(internalRotationNewtons, "IR force");
        if (internalRotationNewtons == 0) {
            return Score.notScorable(Unit.RATIO, Citations.RIEMANN_2010, NotScorable.Reason.UNDEFINED,
                    "ER:IR ratio is undefined when IR force is 0");
        }
        return Score.of(externalRotationNewtons / internalRotationNewtons, Unit.RATIO, Citations.RIEMANN_2010);
    }
}
