package org.swingclearance.engine.envelope;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.swingclearance.engine.mechanics.Assessment;
import org.swingclearance.engine.mechanics.Assessor;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.EngineVersion;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.Verdict;

/**
 * Inverts the constraints of {@link Assessor} around one configuration (engine.md §6): the furthest grip from the
 * head, the shortest cycle time and the heaviest mass of the club's shape that are permitted. Each limit is found
 * by a 32-step scan from the demanding end of its range and bisection of the first edge to
 * 1e-6 relative, so every returned limit is permitted and any value 1 % beyond it is not. When no value in the range
 * is permitted the limit is {@link LimitStatus#NOT_PERMISSIBLE}, never clipped. Stateless and thread-safe.
 */
public final class EnvelopeCalculator {

    /** Cycle-time range searched, s. */
    public static final double MIN_CYCLE_TIME_S = 0.6;
    public static final double MAX_CYCLE_TIME_S = 8.0;
    /** Club-mass range searched, kg: from a token mass (the arm alone, in effect) to 50 kg. */
    public static final double MIN_CLUB_MASS_KG = 0.001;
    public static final double MAX_CLUB_MASS_KG = 50.0;

    static final String SEARCH = "Each limit is the permitted value nearest the demanding end of its range, found"
            + " by a 32-step scan and bisection to 1e-6 relative; a limit with nothing permitted in its range is"
            + " reported as not permissible, never clipped.";
    static final String SHAPE = "The heaviest mass keeps the club's shape: its balance point and radius of"
            + " gyration stay fixed while the mass changes.";
    static final String RANGE = "Grip marks are searched from the knob to the end of the handle, cycle times from"
            + " 0.6 s to 8 s, club masses up to 50 kg.";

    private EnvelopeCalculator() {
    }

    /** The assessment at the configuration and all three limits. */
    public static Envelope envelope(Configuration configuration, Capacity capacity, LoadRules rules) {
        Assessment at = Assessor.assess(configuration, capacity, rules);
        return new Envelope(at,
                furthestGrip(configuration, capacity, rules),
                shortestCycleTime(configuration, capacity, rules),
                heaviestMass(configuration, capacity, rules),
                at.maxHalfArcRad(),
                List.of(SEARCH, RANGE, SHAPE),
                EngineVersion.ENGINE_VERSION);
    }

    /** Smallest permitted grip mark in [0, handle length] at the configuration's cycle time. */
    public static GripLimit furthestGrip(Configuration configuration, Capacity capacity, LoadRules rules) {
        Club club = configuration.club();
        // The handle's end unless the club's centre of mass would pass the shoulder before it (not a real grip).
        double lenient = Math.min(club.handleLengthM(),
                configuration.shoulderToGripM() + club.balancePointM() - 1e-6);
        Verdict atLenient = Assessor.verdict(configuration.withGripMark(lenient), capacity, rules);
        // Hold torque and grip pull only grow with the moment arm: failing at the shortest arm, they fail at all.
        if (!Assessor.patternAllowed(configuration.pattern(), capacity, rules)
                || Assessor.monotoneRatio(configuration.withGripMark(lenient), capacity, rules) > 1.0) {
            return new GripLimit(LimitStatus.NOT_PERMISSIBLE, null, null, atLenient);
        }
        double limit = LimitSearch.nearestPermitted(
                grip -> Assessor.demandRatio(configuration.withGripMark(grip), capacity, rules), 0.0, lenient);
        if (Double.isNaN(limit)) {
            return new GripLimit(LimitStatus.NOT_PERMISSIBLE, null, null, atLenient);
        }
        Configuration atLimit = configuration.withGripMark(limit);
        return new GripLimit(LimitStatus.OK, limit, atLimit.momentArmM(),
                Assessor.verdict(atLimit, capacity, rules));
    }

    /** Smallest permitted cycle time in [0.6, 8] s at the configuration's grip mark. */
    public static CycleTimeLimit shortestCycleTime(Configuration configuration, Capacity capacity, LoadRules rules) {
        Verdict atSlowest = Assessor.verdict(configuration.withCycleTime(MAX_CYCLE_TIME_S), capacity, rules);
        // Hold torque does not depend on the tempo and grip pull falls as the swing slows: failing at the slowest
        // cycle time, they fail at every tempo.
        if (!Assessor.patternAllowed(configuration.pattern(), capacity, rules)
                || Assessor.monotoneRatio(configuration.withCycleTime(MAX_CYCLE_TIME_S), capacity, rules) > 1.0) {
            return new CycleTimeLimit(LimitStatus.NOT_PERMISSIBLE, null, atSlowest);
        }
        DoubleUnaryOperator ratio = time -> Assessor.demandRatio(configuration.withCycleTime(time), capacity, rules);
        double limit = LimitSearch.nearestPermitted(ratio, MIN_CYCLE_TIME_S, MAX_CYCLE_TIME_S);
        if (Double.isNaN(limit)) {
            return new CycleTimeLimit(LimitStatus.NOT_PERMISSIBLE, null, atSlowest);
        }
        return new CycleTimeLimit(LimitStatus.OK, limit,
                Assessor.verdict(configuration.withCycleTime(limit), capacity, rules));
    }

    /** Largest permitted mass of the club's shape in (0, 50] kg at the configuration's grip mark and cycle time. */
    public static MassLimit heaviestMass(Configuration configuration, Capacity capacity, LoadRules rules) {
        Verdict atLightest = Assessor.verdict(configuration.withClubMass(MIN_CLUB_MASS_KG), capacity, rules);
        // Hold torque and grip pull only grow with the mass: failing at the lightest club, they fail at all.
        if (!Assessor.patternAllowed(configuration.pattern(), capacity, rules)
                || Assessor.monotoneRatio(configuration.withClubMass(MIN_CLUB_MASS_KG), capacity, rules) > 1.0) {
            return new MassLimit(LimitStatus.NOT_PERMISSIBLE, null, atLightest);
        }
        DoubleUnaryOperator ratio = mass -> Assessor.demandRatio(configuration.withClubMass(mass), capacity, rules);
        double limit = LimitSearch.nearestPermitted(ratio, MAX_CLUB_MASS_KG, MIN_CLUB_MASS_KG);
        if (Double.isNaN(limit)) {
            return new MassLimit(LimitStatus.NOT_PERMISSIBLE, null, atLightest);
        }
        return new MassLimit(LimitStatus.OK, limit,
                Assessor.verdict(configuration.withClubMass(limit), capacity, rules));
    }
}
