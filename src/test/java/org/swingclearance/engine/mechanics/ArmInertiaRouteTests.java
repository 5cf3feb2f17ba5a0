package org.swingclearance.engine.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * The engine uses route A for the arm's inertia (Dempster total-arm row). Routes B and C of biomechanics.md §2.2,
 * computed here from the published rows, must agree with it within the disagreement the reference flags (§1.5
 * flags #7 and #8), and route A must not be confused with the common mistake of scaling by the fingertip length.
 */
class ArmInertiaRouteTests {

    private final Body body = CheckCases.m80Body();

    @Test
    void routeBSegmentsWithParallelAxisMatchTheCheckValueAndStayWithinFourPercentOfRouteA() {
        double h = body.statureM();
        double upper = 0.186 * h;
        double fore = 0.146 * h;
        double hand = 0.108 * h;
        double m = body.massKg();
        // Winter Table 4.1 rows: upper arm (0.028, ρ prox 0.542), forearm (0.016, COM 0.430, ρ 0.303),
        // hand (0.006, COM 0.506, ρ 0.297); hand length from Winter Fig. 4.1, as §2.2 route B does.
        double upperArm = 0.028 * m * Math.pow(0.542 * upper, 2);
        double forearm = 0.016 * m * (Math.pow(0.303 * fore, 2) + Math.pow(upper + 0.430 * fore, 2));
        double handPart = 0.006 * m * (Math.pow(0.297 * hand, 2) + Math.pow(upper + fore + 0.506 * hand, 2));
        double routeB = upperArm + forearm + handPart;
        assertThat(routeB).isCloseTo(0.5599944, within(5e-8)); // S7c, derived from Winter Table 4.1 rows
        assertThat(body.armInertiaAboutShoulderKgM2() / routeB - 1.0).isBetween(0.0, 0.04); // §1.5 flag #7
    }

    @Test
    void routeWithComRadiusAndParallelAxisDiffersOnlyByRoundingOfTheTable() {
        double length = body.armLengthM();
        double viaCom = body.armMassKg() * (Math.pow(0.368 * length, 2) + Math.pow(0.530 * length, 2));
        assertThat(viaCom).isCloseTo(0.5815775, within(5e-8)); // S7b, Winter Table 4.1 ρ COM 0.368
        assertThat(Math.abs(viaCom / body.armInertiaAboutShoulderKgM2() - 1.0)).isLessThan(1e-3);
    }

    @Test
    void totalArmLengthEndsAtTheWristNotTheFingertip() {
        // Winter Table 4.1: the total-arm segment runs to the ulnar styloid; scaling ρ by the length to the
        // fingertip would inflate the inertia by ((L_arm + L_h)/L_arm)² (biomechanics.md §1.1).
        double wrong = body.armMassKg() * Math.pow(0.645 * (body.armLengthM() + body.handLengthM()), 2);
        assertThat(body.armInertiaAboutShoulderKgM2()).isLessThan(wrong / 1.5);
    }
}
