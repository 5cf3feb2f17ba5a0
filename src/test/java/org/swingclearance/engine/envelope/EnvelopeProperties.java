package org.swingclearance.engine.envelope;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.swingclearance.engine.mechanics.Assessor;
import org.swingclearance.engine.mechanics.Capacity;
import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.LoadRules;

/**
 * engine.md §6: every returned limit is permitted and 1 % beyond it is not; NOT_PERMISSIBLE exactly when no value
 * in the range is permitted (checked on 200 evenly spaced values of the range).
 */
class EnvelopeProperties {

    private static final int PROBES = 200;

    @Provide
    Arbitrary<Configuration> configurations() {
        return EnvelopeArbitraries.configurations();
    }

    @Provide
    Arbitrary<Capacity> capacities() {
        return EnvelopeArbitraries.capacities();
    }

    @Provide
    Arbitrary<LoadRules> rules() {
        return EnvelopeArbitraries.rules();
    }

    @Property(tries = 300)
    void furthestGripIsPermittedAndAOnePercentLongerMomentArmIsNot(@ForAll("configurations") Configuration c,
            @ForAll("capacities") Capacity capacity, @ForAll("rules") LoadRules rules) {
        GripLimit limit = EnvelopeCalculator.furthestGrip(c, capacity, rules);
        double handle = c.club().handleLengthM();
        if (limit.status() == LimitStatus.OK) {
            Configuration at = c.withGripMark(limit.gripMarkM());
            assertThat(Assessor.verdict(at, capacity, rules).permitted()).isTrue();
            double beyond = limit.gripMarkM() - 0.01 * at.momentArmM();
            if (beyond >= 0.0) {
                assertThat(Assessor.verdict(c.withGripMark(beyond), capacity, rules).permitted()).isFalse();
            }
            for (int i = 0; i <= PROBES; i++) {
                double grip = Math.min(handle, handle * i / PROBES);
                if (grip < beyond) {
                    assertThat(Assessor.verdict(c.withGripMark(grip), capacity, rules).permitted())
                            .as("grip mark %s nearer the knob than the limit %s", grip, limit.gripMarkM()).isFalse();
                }
            }
        } else {
            for (int i = 0; i <= PROBES; i++) {
                double grip = Math.min(handle, handle * i / PROBES);
                assertThat(Assessor.verdict(c.withGripMark(grip), capacity, rules).permitted())
                        .as("grip mark %s of a not-permissible club", grip).isFalse();
            }
        }
    }

    @Property(tries = 300)
    void shortestCycleTimeIsPermittedAndOnePercentFasterIsNot(@ForAll("configurations") Configuration c,
            @ForAll("capacities") Capacity capacity, @ForAll("rules") LoadRules rules) {
        CycleTimeLimit limit = EnvelopeCalculator.shortestCycleTime(c, capacity, rules);
        double low = EnvelopeCalculator.MIN_CYCLE_TIME_S;
        double high = EnvelopeCalculator.MAX_CYCLE_TIME_S;
        if (limit.status() == LimitStatus.OK) {
            assertThat(Assessor.verdict(c.withCycleTime(limit.cycleTimeS()), capacity, rules).permitted()).isTrue();
            double beyond = 0.99 * limit.cycleTimeS();
            if (beyond >= low) {
                assertThat(Assessor.verdict(c.withCycleTime(beyond), capacity, rules).permitted()).isFalse();
            }
            for (int i = 0; i <= PROBES; i++) {
                double time = Math.min(high, low + (high - low) * i / PROBES);
                if (time < beyond) {
                    assertThat(Assessor.verdict(c.withCycleTime(time), capacity, rules).permitted())
                            .as("cycle time %s faster than the limit %s", time, limit.cycleTimeS()).isFalse();
                }
            }
        } else {
            for (int i = 0; i <= PROBES; i++) {
                double time = Math.min(high, low + (high - low) * i / PROBES);
                assertThat(Assessor.verdict(c.withCycleTime(time), capacity, rules).permitted())
                        .as("cycle time %s of a not-permissible configuration", time).isFalse();
            }
        }
    }

    @Property(tries = 300)
    void heaviestMassIsPermittedAndOnePercentHeavierIsNot(@ForAll("configurations") Configuration c,
            @ForAll("capacities") Capacity capacity, @ForAll("rules") LoadRules rules) {
        MassLimit limit = EnvelopeCalculator.heaviestMass(c, capacity, rules);
        double low = EnvelopeCalculator.MIN_CLUB_MASS_KG;
        double high = EnvelopeCalculator.MAX_CLUB_MASS_KG;
        if (limit.status() == LimitStatus.OK) {
            assertThat(Assessor.verdict(c.withClubMass(limit.massKg()), capacity, rules).permitted()).isTrue();
            double beyond = 1.01 * limit.massKg();
            if (beyond <= high) {
                assertThat(Assessor.verdict(c.withClubMass(beyond), capacity, rules).permitted()).isFalse();
            }
            for (int i = 0; i <= PROBES; i++) {
                double mass = Math.min(high, low + (high - low) * i / PROBES);
                if (mass > beyond) {
                    assertThat(Assessor.verdict(c.withClubMass(mass), capacity, rules).permitted())
                            .as("mass %s heavier than the limit %s", mass, limit.massKg()).isFalse();
                }
            }
        } else {
            for (int i = 0; i <= PROBES; i++) {
                double mass = Math.min(high, low + (high - low) * i / PROBES);
                assertThat(Assessor.verdict(c.withClubMass(mass), capacity, rules).permitted())
                        .as("mass %s of a not-permissible configuration", mass).isFalse();
            }
        }
    }
}
