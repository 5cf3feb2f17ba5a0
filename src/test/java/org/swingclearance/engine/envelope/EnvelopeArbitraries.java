package org.swingclearance.engine.envelope;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Club;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.Gravity;
import org.swingclearance.engine.mechanics.LoadRules;
import org.swingclearance.engine.mechanics.SwingKind;
import org.swingclearance.engine.mechanics.SwingPattern;

/** Generators of plausible patients, clubs, patterns and rules for the engine's properties (invented data). */
final class EnvelopeArbitraries {

    private EnvelopeArbitraries() {
    }

    static Arbitrary<Body> bodies() {
        return Combinators.combine(Arbitraries.doubles().between(1.50, 2.00), Arbitraries.doubles().between(45, 130))
                .as(Body::of);
    }

    /** Clubs of 1–15 kg, 0.35–1.0 m, balance point in the head half, inertia from the model or the bound. */
    static Arbitrary<Club> clubs() {
        return Combinators.combine(
                Arbitraries.doubles().between(1.0, 15.0),
                Arbitraries.doubles().between(0.35, 1.0),
                Arbitraries.doubles().between(0.55, 0.90),
                Arbitraries.doubles().between(0.1, 0.99),
                Arbitraries.doubles().between(0.15, 0.7),
                Arbitraries.of(true, false))
                .as((mass, length, balanceFraction, headPosition, handleFraction, modelled) -> {
                    double balance = balanceFraction * length;
                    double head = balance + headPosition * (length - balance);
                    return Club.withBestInertia(mass, length, balance, handleFraction * length, null, null,
                            modelled ? head : null, Gravity.STANDARD);
                });
    }

    static Arbitrary<SwingPattern> patterns() {
        return Combinators.combine(
                Arbitraries.doubles().between(-20, 110),
                Arbitraries.doubles().between(10, 110),
                Arbitraries.of(1, 2),
                Arbitraries.doubles().between(0.7, 1.0),
                Arbitraries.of(SwingKind.class))
                .as((centre, halfArc, hands, reach, kind) ->
                        SwingPattern.ofDegrees(centre, Math.min(halfArc, 180.0 - Math.abs(centre)), hands, reach,
                                kind, false));
    }

    static Arbitrary<Configuration> configurations() {
        return Combinators.combine(bodies(), clubs(), Arbitraries.doubles().between(0.0, 1.0), patterns(),
                        Arbitraries.doubles().between(0.8, 4.0))
                .as((body, club, gripFraction, pattern, cycleTime) -> new Configuration(body, club,
                        gripFraction * club.handleLengthM(), pattern, cycleTime, Gravity.STANDARD));
    }

    /** Shoulder torque 15–120 N·m; grip 10–60 kg or not measured. */
    static Arbitrary<Capacity> capacities() {
        return Combinators.combine(Arbitraries.doubles().between(15, 120),
                        Arbitraries.doubles().between(10, 60).injectNull(0.3))
                .as(Capacity::of);
    }

    static Arbitrary<LoadRules> rules() {
        return Combinators.combine(Arbitraries.doubles().between(0.1, 0.9), Arbitraries.of(true, false))
                .as((fraction, controlledStop) -> LoadRules.forFraction(fraction).withControlledStop(controlledStop));
    }
}
