package org.swingclearance.envelope;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.IntStream;
import org.swingclearance.engine.envelope.Envelope;
import org.swingclearance.engine.envelope.EnvelopeCalculator;
import org.swingclearance.engine.envelope.LimitStatus;
import org.swingclearance.engine.mechanics.Assessment;
import org.swingclearance.engine.mechanics.Assessor;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.ClubInertia;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.Demand;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.mechanics.InertiaSource;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.SwingPatternView;

/**
 * Turns stored inputs into engine calls and engine results into envelope rows: the only place the envelope
 * feature meets the mechanics engine. No formula of its own; standard gravity throughout.
 */
final class EnvelopeComputation {

    /**
     * The usual grip: the centre of the hand about 5 cm from the knob end when the hand rests against the knob
     * (the grip of biomechanics.md CASE-M80; common practice, no source), or the handle's end if it is shorter.
     */
    static final double USUAL_GRIP_M = 0.05;
    static final int GRIP_SERIES_POINTS = 41;
    static final double CYCLE_SERIES_STEP_S = 0.1;

    private EnvelopeComputation() {
    }

    /**
     * Every club × pattern of the inputs, in club order then pattern order. The pairs are independent, so they are
     * computed in parallel (the engine is stateless and thread-safe); the result does not depend on the order.
     */
    static EnvelopeOutputs compute(EnvelopeInputs in) {
        Body body = body(in.body());
        List<Club> engineClubs = in.clubs().stream().map(EnvelopeComputation::club).toList();
        int patternCount = in.patterns().size();
        List<Judged> judged = IntStream.range(0, in.clubs().size() * patternCount).parallel()
                .mapToObj(i -> row(body, in.clubs().get(i / patternCount), engineClubs.get(i / patternCount),
                        in.patterns().get(i % patternCount), in))
                .toList();
        Set<String> statements = new LinkedHashSet<>();
        judged.forEach(j -> statements.addAll(j.statements()));
        return new EnvelopeOutputs(judged.stream().map(Judged::row).toList(), notes(in), List.copyOf(statements));
    }

    /** One row with the engine's statements of the model and search it used. */
    private record Judged(EnvelopeRow row, List<String> statements) {
    }

    /** The what-if of one configuration with its chart series; {@code gripMarkM} is clamped to the handle. */
    static WhatIf whatIf(EnvelopeInputs in, ClubView clubView, SwingPatternView patternView, double gripMarkM,
                         double cycleTimeS) {
        Club club = club(clubView);
        double grip = Math.max(0.0, Math.min(gripMarkM, club.handleLengthM()));
        double time = Math.max(EnvelopeCalculator.MIN_CYCLE_TIME_S, Math.min(cycleTimeS,
                EnvelopeCalculator.MAX_CYCLE_TIME_S));
        Capacity capacity = capacity(in.capacity(), patternView.hands());
        double handleCm = club.handleLengthM() * 100.0;
        if (capacity == null) {
            return empty(clubView, patternView, grip, time, EnvelopeRow.NO_CAPACITY, handleCm);
        }
        LoadRules rules = rules(in.rules(), in.capacity(), patternView);
        Configuration configuration;
        try {
            configuration = new Configuration(body(in.body()), club, grip, pattern(patternView), time,
                    Gravity.STANDARD);
        } catch (IllegalArgumentException cannotBeHeld) {
            return empty(clubView, patternView, grip, time, EnvelopeRow.INVALID, handleCm);
        }
        Assessment a = Assessor.assess(configuration, capacity, rules);
        Demand demand = a.demand();
        Double gripAllowance = capacity.gripStrengthKg() == null ? null
                : rules.effectiveGripFraction() * capacity.gripStrengthKg() * Gravity.STANDARD;
        return new WhatIf(clubView.id(), patternView.id(), grip * 100.0, time, 60.0 / time, EnvelopeRow.COMPUTED,
                a.permitted(), finite(a.demandRatio()), a.binding().name(), null, null,
                finite(a.shoulderTorqueRatio()), finite(a.holdTorqueRatio()), finite(a.gripPullRatio()),
                demand.peakShoulderTorqueNm(), demand.holdTorqueNm(),
                rules.bandFraction() * capacity.shoulderFlexionTorqueNm(), demand.peakGripPullN(), gripAllowance,
                demand.peakWristMomentNm(), demand.momentArmM() * 100.0,
                a.maxHalfArcRad() == null ? null : Math.toDegrees(a.maxHalfArcRad()), handleCm,
                gripSeries(configuration, capacity, rules), cycleSeries(configuration, capacity, rules));
    }

    private static Judged row(Body body, ClubView clubView, Club club, SwingPatternView patternView,
                              EnvelopeInputs in) {
        double usualGrip = Math.min(USUAL_GRIP_M, club.handleLengthM());
        Capacity capacity = capacity(in.capacity(), patternView.hands());
        if (capacity == null) {
            return new Judged(unjudged(clubView, patternView, usualGrip, EnvelopeRow.NO_CAPACITY), List.of());
        }
        Configuration configuration;
        try {
            configuration = new Configuration(body, club, usualGrip, pattern(patternView), in.cycleTimeS(),
                    Gravity.STANDARD);
        } catch (IllegalArgumentException cannotBeHeld) {
            return new Judged(unjudged(clubView, patternView, usualGrip, EnvelopeRow.INVALID), List.of());
        }
        Envelope e = EnvelopeCalculator.envelope(configuration, capacity, rules(in.rules(), in.capacity(),
                patternView));
        List<String> statements = new ArrayList<>(e.atConfiguration().demand().assumptions());
        statements.addAll(e.assumptions());
        Assessment at = e.atConfiguration();
        boolean gripOk = e.furthestGrip().status() == LimitStatus.OK;
        boolean cycleOk = e.shortestCycle().status() == LimitStatus.OK;
        boolean massOk = e.heaviestMass().status() == LimitStatus.OK;
        Double furthestCm = gripOk ? e.furthestGrip().gripMarkM() * 100.0 : null;
        return new Judged(new EnvelopeRow(clubView.id(), clubView.name(), clubView.massKg(), clubView.inertiaSource(),
                patternView.id(), patternView.name(), patternView.hands(), EnvelopeRow.COMPUTED, at.permitted(),
                finite(at.demandRatio()), at.binding().name(), usualGrip * 100.0, furthestCm,
                gripOk ? Math.max(0.0, furthestCm - usualGrip * 100.0) : null,
                gripOk ? e.furthestGrip().momentArmM() * 100.0 : null,
                gripOk ? null : e.furthestGrip().verdict().binding().name(),
                cycleOk ? e.shortestCycle().cycleTimeS() : null,
                cycleOk ? e.shortestCycle().cyclesPerMinute() : null,
                cycleOk ? null : e.shortestCycle().verdict().binding().name(),
                massOk ? e.heaviestMass().massKg() : null,
                massOk ? null : e.heaviestMass().verdict().binding().name(),
                e.maxHalfArcRad() == null ? null : Math.toDegrees(e.maxHalfArcRad())), statements);
    }

    /** D across the handle at the configuration's cycle time; the gates (C4, C5) are not part of D. */
    private static List<WhatIf.Point> gripSeries(Configuration c, Capacity capacity, LoadRules rules) {
        double handle = c.club().handleLengthM();
        List<WhatIf.Point> points = new ArrayList<>(GRIP_SERIES_POINTS);
        for (int i = 0; i < GRIP_SERIES_POINTS; i++) {
            double grip = handle * i / (GRIP_SERIES_POINTS - 1);
            points.add(new WhatIf.Point(grip * 100.0, ratioOrNull(() -> c.withGripMark(grip), capacity, rules)));
        }
        return points;
    }

    /** D from the fastest to the slowest cycle time searched, at the configuration's grip mark. */
    private static List<WhatIf.Point> cycleSeries(Configuration c, Capacity capacity, LoadRules rules) {
        List<WhatIf.Point> points = new ArrayList<>();
        int steps = (int) Math.round((EnvelopeCalculator.MAX_CYCLE_TIME_S - EnvelopeCalculator.MIN_CYCLE_TIME_S)
                / CYCLE_SERIES_STEP_S);
        for (int i = 0; i <= steps; i++) {
            double time = EnvelopeCalculator.MIN_CYCLE_TIME_S + i * CYCLE_SERIES_STEP_S;
            points.add(new WhatIf.Point(time, ratioOrNull(() -> c.withCycleTime(time), capacity, rules)));
        }
        return points;
    }

    private static Double ratioOrNull(java.util.function.Supplier<Configuration> configuration, Capacity capacity,
                                      LoadRules rules) {
        try {
            return finite(Assessor.demandRatio(configuration.get(), capacity, rules));
        } catch (IllegalArgumentException cannotBeHeld) {
            return null;
        }
    }

    /** What the engine could not check, as message keys for the page. */
    private static List<String> notes(EnvelopeInputs in) {
        List<String> keys = new ArrayList<>();
        EnvelopeInputs.CapacityInput c = in.capacity();
        if (c.torqueInvolvedNm() == null && in.patterns().stream().anyMatch(p -> p.hands() == 1)) {
            keys.add("envelope.note.noTorqueInvolved");
        }
        if (c.torqueWeakerNm() == null && in.patterns().stream().anyMatch(p -> p.hands() == 2)) {
            keys.add("envelope.note.noTorqueWeaker");
        }
        if (c.gripInvolvedKg() == null || c.gripWeakerKg() == null) {
            keys.add("envelope.note.gripNotMeasured");
        }
        if (c.activeFlexionDeg() == null) {
            keys.add("envelope.note.rangeNotMeasured");
        }
        if (!in.rules().controlledStop()) {
            keys.add("envelope.note.controlledStopOff");
        }
        if (in.body().shoulderToGripMeasuredM() == null) {
            keys.add("envelope.note.reachEstimated");
        }
        if (in.clubs().stream().anyMatch(club -> "BOUND".equals(club.inertiaSource()))) {
            keys.add("envelope.note.inertiaBound");
        }
        return keys;
    }

    static Body body(EnvelopeInputs.BodyInput b) {
        return new Body(b.statureM(), b.bodyMassKg(), b.shoulderToGripMeasuredM());
    }

    static Club club(ClubView c) {
        return new Club(c.massKg(), c.lengthM(), c.balancePointM(), c.handleLengthM(),
                new ClubInertia(c.inertiaAboutBalancePointKgM2(), InertiaSource.valueOf(c.inertiaSource())));
    }

    static SwingPattern pattern(SwingPatternView p) {
        return SwingPattern.ofDegrees(p.centreDeg(), p.halfArcDeg(), p.hands(), p.reach(), SwingKind.valueOf(p.kind()),
                p.hipDriven());
    }

    /**
     * The capacity a pattern is judged against: the involved side's torque and grip for one hand, the weaker
     * side's for two (engine.md §5); null when that torque was not measured (then there are no limits).
     */
    static Capacity capacity(EnvelopeInputs.CapacityInput c, int hands) {
        Double torque = hands == 2 ? c.torqueWeakerNm() : c.torqueInvolvedNm();
        if (torque == null) {
            return null;
        }
        Double grip = hands == 2 ? c.gripWeakerKg() : c.gripInvolvedKg();
        Capacity capacity = new Capacity(torque, grip, null,
                c.lumbopelvicBand() == null ? null : LoadBand.valueOf(c.lumbopelvicBand()));
        if (c.activeFlexionDeg() != null) {
            // A measured range above 180° (hyperflexion) is taken as 180°, the engine's largest arm angle.
            capacity = capacity.withShoulderFlexionRangeDeg(Math.max(0.0, Math.min(180.0, c.activeFlexionDeg())));
        }
        return capacity;
    }

    /**
     * The rules a pattern is judged by: the shoulder band's fraction, and for a hip-driven pattern the stricter of
     * the practice rules' minimum lumbopelvic band and the pattern's own.
     */
    static LoadRules rules(EnvelopeInputs.RulesInput r, EnvelopeInputs.CapacityInput c, SwingPatternView pattern) {
        LoadBand minimum = LoadBand.valueOf(r.hipDrivenMinimumBand());
        if (pattern.minimumLumbopelvicBand() != null) {
            LoadBand own = LoadBand.valueOf(pattern.minimumLumbopelvicBand());
            minimum = minimum.isMoreRestrictiveThan(own) ? own : minimum;
        }
        return new LoadRules(c.shoulderBandFraction(), r.gripFraction(), r.controlledStop(),
                Math.toRadians(r.rangeMarginDeg()), minimum);
    }

    private static EnvelopeRow unjudged(ClubView club, SwingPatternView pattern, double usualGrip, String status) {
        return new EnvelopeRow(club.id(), club.name(), club.massKg(), club.inertiaSource(), pattern.id(),
                pattern.name(), pattern.hands(), status, false, null, null, usualGrip * 100.0, null, null, null,
                null, null, null, null, null, null, null);
    }

    private static WhatIf empty(ClubView club, SwingPatternView pattern, double grip, double time, String status,
                                double handleCm) {
        return new WhatIf(club.id(), pattern.id(), grip * 100.0, time, 60.0 / time, status, false, null, null, null,
                null, null, null, null, null, null, null, null, null, null, null, null, handleCm, List.of(),
                List.of());
    }

    /** Infinite or undefined ratios (no allowance at all) are stored as null: JSON has no infinity. */
    private static Double finite(Double value) {
        return value == null || !Double.isFinite(value) ? null : value;
    }
}
