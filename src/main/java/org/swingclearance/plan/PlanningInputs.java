package org.swingclearance.plan;

import java.util.List;
import java.util.UUID;

/**
 * Everything a plan version is computed from, in plain SI values: the patient's body and measured capacity from the
 * signed screening, the load band the plan may use and the one above it, the practice rules that shape the
 * constraints, the swing pattern, the clubs and the cycle-time ladder. Stored with each version as its inputs
 * snapshot, so a signed plan can be recomputed and checked later.
 *
 * @param band              the band the plan may use (the lower of the episode's regions)
 * @param nextBand          the band above, or null when the plan is already in Open
 * @param nextBandFraction  its fraction of capacity, or null with {@code nextBand}
 * @param shoulderTorqueNm  involved side for one-hand patterns, weaker side for two-hand patterns
 * @param lumbopelvicBand   the patient's lumbopelvic band (C5, hip-driven patterns), or null when not screened
 */
public record PlanningInputs(double statureM, double bodyMassKg, Double shoulderToGripM, double shoulderTorqueNm,
                             Double gripStrengthKg, Double activeFlexionDeg, String lumbopelvicBand, String band,
                             double bandFraction, String nextBand, Double nextBandFraction, Double gripFraction,
                             boolean controlledStop, double rangeMarginDeg, String hipDrivenMinimumBand,
                             PatternInput pattern, List<ClubInput> clubs, List<Double> cycleLadderS) {

    public PlanningInputs {
        clubs = List.copyOf(clubs);
        cycleLadderS = List.copyOf(cycleLadderS);
    }

    /** The swing pattern of the plan (angles in degrees from the hanging arm, forward/up positive). */
    public record PatternInput(UUID id, String name, double centreDeg, double halfArcDeg, int hands, double reach,
                               String kind, boolean hipDriven, String minimumLumbopelvicBand) {
    }

    /** A club of the inventory: lengths in metres from the knob, inertia about the balance point with its source. */
    public record ClubInput(UUID id, String name, double massKg, double lengthM, double balancePointM,
                            double handleLengthM, Double headCentreM, Double inertiaKgM2, String inertiaSource) {
    }
}
