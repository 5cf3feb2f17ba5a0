package org.swingclearance.equipment;

import org.swingclearance.engine.mechanics.ClubInertia;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.mechanics.PendulumTiming;
import org.swingclearance.engine.mechanics.RodAndHeadModel;

/**
 * Checks a club's measurements against each other and works out its inertia through the engine. Every refusal
 * names the field to mark and says which measurement to repeat; nothing here stores anything.
 */
final class ClubMeasurements {

    static final double MAX_MASS_KG = 50.0;
    static final double MAX_LENGTH_M = 2.0;

    private ClubMeasurements() {
    }

    /**
     * The club's inertia about its balance point by the chosen method, with the safe bound beside it.
     *
     * @throws MeasurementRejected when the measurements contradict each other or the pendulum result is not
     *                             plausible (≤ 0 or above the bound)
     */
    static InertiaEstimate check(ClubDetails d) {
        if (!(d.massKg() > 0 && d.massKg() <= MAX_MASS_KG)) {
            throw new MeasurementRejected("mass", "club.error.massRange", MAX_MASS_KG);
        }
        if (!(d.lengthM() > 0 && d.lengthM() <= MAX_LENGTH_M)) {
            throw new MeasurementRejected("length", "club.error.lengthRange", MAX_LENGTH_M * 100);
        }
        if (!(d.balancePointM() > 0 && d.balancePointM() < d.lengthM())) {
            throw new MeasurementRejected("balancePoint", "club.error.balanceBeyondLength");
        }
        if (!(d.handleLengthM() >= 0 && d.handleLengthM() <= d.lengthM())) {
            throw new MeasurementRejected("handleLength", "club.error.handleLongerThanClub");
        }
        if (d.headCentreM() != null && !(d.headCentreM() > 0 && d.headCentreM() <= d.lengthM())) {
            throw new MeasurementRejected("headCentre", "club.error.headCentreBeyondLength");
        }
        double bound = ClubInertia.bound(d.massKg(), d.lengthM(), d.balancePointM()).aboutBalancePointKgM2();
        return switch (d.method()) {
            case PENDULUM -> fromPendulum(d, bound);
            case HEAD_MODEL -> fromHeadModel(d, bound);
            case BOUND -> new InertiaEstimate(bound, "BOUND", bound, null, null);
        };
    }

    private static InertiaEstimate fromPendulum(ClubDetails d, double bound) {
        PendulumReading p = d.pendulum();
        if (p == null) {
            throw new MeasurementRejected("pendulumSeconds", "club.error.pendulumMissing");
        }
        if (!(p.pivotFromBalancePointM() > 0 && p.pivotFromBalancePointM() <= d.lengthM())) {
            throw new MeasurementRejected("pendulumPivot", "club.error.pivotRange");
        }
        if (p.swings() < 1 || p.swings() > PendulumTiming.MAX_SWINGS) {
            throw new MeasurementRejected("pendulumSwings", "club.error.swingsRange", PendulumTiming.MAX_SWINGS);
        }
        if (!(p.seconds() > 0 && p.seconds() <= PendulumTiming.MAX_SECONDS)) {
            throw new MeasurementRejected("pendulumSeconds", "club.error.secondsRange", PendulumTiming.MAX_SECONDS);
        }
        PendulumTiming timing = new PendulumTiming(p.pivotFromBalancePointM(), p.swings(), p.seconds());
        double inertia;
        try {
            inertia = timing.inertiaAboutBalancePointKgM2(d.massKg(), Gravity.STANDARD);
        } catch (IllegalArgumentException nonPositive) {
            // The engine refuses a timing that gives I_cm ≤ 0; the form says which measurements to repeat.
            throw new MeasurementRejected("pendulumSeconds", "club.error.pendulumNonPositive");
        }
        if (inertia > bound) {
            throw new MeasurementRejected("pendulumSeconds", "club.error.pendulumAboveBound",
                    String.format(java.util.Locale.ROOT, "%.4f", inertia),
                    String.format(java.util.Locale.ROOT, "%.4f", bound));
        }
        return new InertiaEstimate(inertia, "MEASURED", bound, timing.periodS(),
                timing.equivalentLengthM(Gravity.STANDARD));
    }

    private static InertiaEstimate fromHeadModel(ClubDetails d, double bound) {
        if (d.headCentreM() == null) {
            throw new MeasurementRejected("headCentre", "club.error.headCentreMissing");
        }
        if (!RodAndHeadModel.applies(d.lengthM(), d.balancePointM(), d.headCentreM())) {
            throw new MeasurementRejected("headCentre", "club.error.headModelGeometry");
        }
        double inertia = ClubInertia.modelled(d.massKg(), d.lengthM(), d.balancePointM(), d.headCentreM())
                .aboutBalancePointKgM2();
        return new InertiaEstimate(inertia, "MODELLED", bound, null, null);
    }
}
