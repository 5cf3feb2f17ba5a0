package org.swingclearance.calculation.web;

import java.util.List;
import org.swingclearance.engine.envelope.CycleTimeLimit;
import org.swingclearance.engine.envelope.Envelope;
import org.swingclearance.engine.envelope.GripLimit;
import org.swingclearance.engine.envelope.LimitStatus;
import org.swingclearance.engine.envelope.MassLimit;
import org.swingclearance.engine.mechanics.Assessment;
import org.swingclearance.engine.mechanics.Constraint;
import org.swingclearance.engine.mechanics.Demand;
import org.swingclearance.engine.mechanics.InertiaSource;

/**
 * The envelope of one club and pattern: the configuration as given, judged, and the three limits. A limit that is
 * NOT_PERMISSIBLE has null values. {@code maxHalfArcDeg} is set only when the range of motion excludes the pattern.
 */
public record EnvelopeResponse(AtConfiguration atConfiguration, MaxMomentArm maxMomentArm, MinCycleTime minCycleTime,
                               MaxClubMass maxClubMass, Double maxHalfArcDeg, List<String> assumptions,
                               String engineVersion) {

    /** The demand fields plus the verdict. {@code demandRatio} is null when the band fraction is 0 (Hold). */
    public record AtConfiguration(double shoulderToGripM, double momentArmM, double clubInertiaAboutBalancePointKgM2,
                                  InertiaSource clubInertiaSource, double systemInertiaKgM2, double naturalPeriodS,
                                  double peakAngularVelocityRadS, double peakShoulderTorqueNm, double holdTorqueNm,
                                  double peakGripPullN, double peakWristMomentNm, double positiveWorkPerCycleJ,
                                  List<String> assumptions, boolean permitted, Double demandRatio,
                                  Constraint binding) {
    }

    /** Furthest grip from the head at the given cycle time. */
    public record MaxMomentArm(LimitStatus status, Double gripMarkM, Double momentArmM) {
    }

    /** Shortest cycle time at the given grip mark. */
    public record MinCycleTime(LimitStatus status, Double cycleTimeS) {
    }

    /** Heaviest club of this shape at the given grip mark and cycle time. */
    public record MaxClubMass(LimitStatus status, Double massKg) {
    }

    static EnvelopeResponse of(Envelope envelope) {
        Assessment at = envelope.atConfiguration();
        Demand d = at.demand();
        double ratio = at.demandRatio();
        AtConfiguration atConfiguration = new AtConfiguration(d.shoulderToGripM(), d.momentArmM(),
                d.clubInertiaAboutBalancePointKgM2(), d.clubInertiaSource(), d.systemInertiaKgM2(),
                d.naturalPeriodS(), d.peakAngularVelocityRadS(), d.peakShoulderTorqueNm(), d.holdTorqueNm(),
                d.peakGripPullN(), d.peakWristMomentNm(), d.positiveWorkPerCycleJ(),
                DemandResponse.sentences(d, at.notes()), at.permitted(), Double.isFinite(ratio) ? ratio : null,
                at.binding());
        GripLimit grip = envelope.furthestGrip();
        CycleTimeLimit cycle = envelope.shortestCycle();
        MassLimit mass = envelope.heaviestMass();
        Double halfArc = envelope.maxHalfArcRad() == null ? null : Math.toDegrees(envelope.maxHalfArcRad());
        return new EnvelopeResponse(atConfiguration,
                new MaxMomentArm(grip.status(), grip.gripMarkM(), grip.momentArmM()),
                new MinCycleTime(cycle.status(), cycle.cycleTimeS()),
                new MaxClubMass(mass.status(), mass.massKg()),
                halfArc, envelope.assumptions(), envelope.engineVersion());
    }
}
