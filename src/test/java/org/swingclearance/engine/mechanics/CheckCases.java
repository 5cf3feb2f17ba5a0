package org.swingclearance.engine.mechanics;

/**
 * The worked cases of biomechanics.md §0.1 and §0.3 as engine inputs. Both use g = 9.81 m/s², the value the
 * published check values were computed with.
 */
final class CheckCases {

    static final double G = 9.81;

    private CheckCases() {
    }

    /** CASE-M80: 80 kg, 1.78 m; 6 kg club, 0.60 m long, balance point 0.45 m, head centre 0.50 m. */
    static Body m80Body() {
        return Body.of(1.78, 80.0);
    }

    static Club m80Club() {
        return new Club(6.0, 0.60, 0.45, 0.30, ClubInertia.modelled(6.0, 0.60, 0.45, 0.50));
    }

    /** One hand, rhythmic, centred on hanging, half-arc 60°, full reach. */
    static SwingPattern rhythmic60() {
        return SwingPattern.ofDegrees(0.0, 60.0, 1, 1.0, SwingKind.RHYTHMIC, false);
    }

    /** CASE-M80 gripped at 0.05 m, rhythmic ±60°, at the given cycle time. */
    static Configuration m80(double cycleTimeS) {
        return new Configuration(m80Body(), m80Club(), 0.05, rhythmic60(), cycleTimeS, G);
    }

    /** CASE-F62: 62 kg, 1.65 m; 4 kg club of the same geometry. */
    static Configuration f62(double cycleTimeS) {
        Club club = new Club(4.0, 0.60, 0.45, 0.30, ClubInertia.modelled(4.0, 0.60, 0.45, 0.50));
        return new Configuration(Body.of(1.65, 62.0), club, 0.05, rhythmic60(), cycleTimeS, G);
    }
}
