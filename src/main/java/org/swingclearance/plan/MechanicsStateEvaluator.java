package org.swingclearance.plan;

import java.util.HashMap;
import java.util.Map;
import org.swingclearance.engine.mechanics.Assessor;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.ClubInertia;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.mechanics.InertiaSource;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;
import org.swingclearance.engine.mechanics.Verdict;
import org.swingclearance.engine.plan.ClubOption;
import org.swingclearance.engine.plan.Evaluation;
import org.swingclearance.engine.plan.StateEvaluator;

/**
 * The mechanics engine (demand and constraints C1–C5, engine.md §4–5) seen through the plan search's
 * {@link StateEvaluator}: for one patient, pattern and band, each (club, grip mark, cycle time) is judged at the
 * band the plan may use and, when it fails there, at the next band (a provisional step behind a re-screen gate).
 *
 * <p>D is always the ratio against the current band, as the search expects; the lumbopelvic band for the hip-drive
 * gate C5 stays the screened one at the next band too (a re-screen, not a plan, raises it). The stricter of the
 * practice rules' and the pattern's own minimum band for hip-driven patterns applies.
 */
final class MechanicsStateEvaluator implements StateEvaluator {

    private final Body body;
    private final Capacity capacity;
    private final LoadRules current;
    private final LoadRules next;
    private final SwingPattern pattern;
    private final Map<String, Club> clubs = new HashMap<>();

    MechanicsStateEvaluator(PlanningInputs in) {
        this.body = new Body(in.statureM(), in.bodyMassKg(), in.shoulderToGripM());
        this.capacity = new Capacity(in.shoulderTorqueNm(), in.gripStrengthKg(),
                in.activeFlexionDeg() == null ? null : Math.toRadians(in.activeFlexionDeg()),
                in.lumbopelvicBand() == null ? null : LoadBand.valueOf(in.lumbopelvicBand()));
        PlanningInputs.PatternInput p = in.pattern();
        this.pattern = SwingPattern.ofDegrees(p.centreDeg(), p.halfArcDeg(), p.hands(), p.reach(),
                SwingKind.valueOf(p.kind()), p.hipDriven());
        LoadBand hipMinimum = LoadBand.valueOf(in.hipDrivenMinimumBand());
        if (p.minimumLumbopelvicBand() != null) {
            // The stricter minimum is the higher band: the less restrictive of the two.
            LoadBand patternMinimum = LoadBand.valueOf(p.minimumLumbopelvicBand());
            hipMinimum = hipMinimum.isMoreRestrictiveThan(patternMinimum) ? patternMinimum : hipMinimum;
        }
        this.current = new LoadRules(in.bandFraction(), in.gripFraction(), in.controlledStop(),
                Math.toRadians(in.rangeMarginDeg()), hipMinimum);
        this.next = in.nextBandFraction() == null ? current : current.withBandFraction(in.nextBandFraction());
        for (PlanningInputs.ClubInput c : in.clubs()) {
            clubs.put(c.id().toString(), engineClub(c));
        }
    }

    /** The inventory as the plan space lists it: id, mass and the furthest grip mark. */
    static ClubOption option(PlanningInputs.ClubInput c) {
        return new ClubOption(c.id().toString(), c.massKg(), c.handleLengthM());
    }

    @Override
    public Evaluation evaluate(ClubOption club, double gripMarkM, double cycleTimeS) {
        Configuration configuration = new Configuration(body, clubs.get(club.id()), gripMarkM, pattern, cycleTimeS,
                Gravity.STANDARD);
        Verdict now = Assessor.verdict(configuration, capacity, current);
        String binding = now.binding().code();
        if (now.permitted()) {
            return Evaluation.withinBand(now.demandRatio(), binding);
        }
        if (next != current && Assessor.verdict(configuration, capacity, next).permitted()) {
            return Evaluation.withinNextBand(now.demandRatio(), binding);
        }
        return Evaluation.outsideEnvelope(now.demandRatio(), binding);
    }

    private static Club engineClub(PlanningInputs.ClubInput c) {
        if (c.inertiaKgM2() != null && c.inertiaSource() != null) {
            return new Club(c.massKg(), c.lengthM(), c.balancePointM(), c.handleLengthM(),
                    new ClubInertia(c.inertiaKgM2(), InertiaSource.valueOf(c.inertiaSource())));
        }
        return Club.withBestInertia(c.massKg(), c.lengthM(), c.balancePointM(), c.handleLengthM(), null, null,
                c.headCentreM(), Gravity.STANDARD);
    }
}
