package org.swingclearance.engine.mechanics;

import java.util.List;

/**
 * What one configuration asks of the body, per arm (engine.md §4). All values are finite and non-negative
 * except where stated.
 *
 * @param configuration                   the inputs this result was computed from
 * @param shoulderToGripM                 ρ·R_g, m
 * @param shoulderToGripSource            measured or estimated from stature
 * @param momentArmM                      r_c, shoulder to the club's centre of mass, m
 * @param clubInertiaAboutBalancePointKgM2 I_cm, kg·m²
 * @param clubInertiaSource               where I_cm came from
 * @param systemInertiaKgM2               I_tot about the shoulder, kg·m²
 * @param firstMomentKgM                  S = m_arm·r_arm + s·m_c·r_c, kg·m
 * @param naturalPeriodS                  2π·√(I_tot/(g·S)), s
 * @param peakAngularVelocityRadS         rad/s
 * @param peakAngularAccelerationRadS2    rad/s²
 * @param peakShoulderTorqueNm            max |τ| over the cycle, N·m
 * @param holdTorqueNm                    g·S·max|sin θ| over the arc: holding still anywhere in it, N·m
 * @param peakGripPullN                   largest pull along the arm at the grip, N (0 if it only pushes)
 * @param peakWristMomentNm               max |M_w| about the grip, N·m
 * @param positiveWorkPerCycleJ           ∫max(τ·θ̇, 0)dt over one cycle, J
 * @param provenance                      where each estimated input came from
 * @param assumptions                     the model's simplifications as plain sentences
 * @param engineVersion                   {@link EngineVersion#ENGINE_VERSION}
 */
public record Demand(Configuration configuration, double shoulderToGripM, ShoulderToGripSource shoulderToGripSource,
                     double momentArmM, double clubInertiaAboutBalancePointKgM2, InertiaSource clubInertiaSource,
                     double systemInertiaKgM2, double firstMomentKgM, double naturalPeriodS,
                     double peakAngularVelocityRadS, double peakAngularAccelerationRadS2, double peakShoulderTorqueNm,
                     double holdTorqueNm, double peakGripPullN, double peakWristMomentNm,
                     double positiveWorkPerCycleJ, List<Provenance> provenance, List<String> assumptions,
                     String engineVersion) {

    public Demand {
        provenance = List.copyOf(provenance);
        assumptions = List.copyOf(assumptions);
    }
}
