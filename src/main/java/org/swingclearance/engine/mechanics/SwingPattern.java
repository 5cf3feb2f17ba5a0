package org.swingclearance.engine.mechanics;

/**
 * A swing pattern in the swing plane (engine.md §3). θ is the angle of the straight arm from hanging vertical,
 * forward/up positive; the pattern spans θ_c − A … θ_c + A.
 *
 * @param centreRad  θ_c, rad, in [−π, π]
 * @param halfArcRad A, rad, in (0, π], with |θ_c| + A ≤ π (the arc stays between straight down behind and
 *                   straight up, never sweeping past them)
 * @param hands      1 or 2; with 2 hands each arm carries half the club (an approximation the output states)
 * @param reach      reach factor ρ in [{@value #MIN_REACH}, 1]; a bent-elbow arc shortens the shoulder-to-grip
 *                   distance to ρ·R_g
 * @param kind       rhythmic or single-arc; never null
 * @param hipDriven  whether the hips drive the swing (constraint C5)
 */
public record SwingPattern(double centreRad, double halfArcRad, int hands, double reach, SwingKind kind,
                           boolean hipDriven) {

    public static final double MIN_REACH = 0.3;
    /** Rounding slack for arcs given in degrees that end exactly at ±180°. */
    private static final double ANGLE_SLACK = 1e-9;

    public SwingPattern {
        Checks.inRange("pattern centre (rad)", centreRad, -Math.PI, Math.PI);
        Checks.aboveAtMost("half-arc (rad)", halfArcRad, 0.0, Math.PI);
        if (Math.abs(centreRad) + halfArcRad > Math.PI + ANGLE_SLACK) {
            throw new IllegalArgumentException("the arc must stay within -180° and 180°: centre ± half-arc was "
                    + Math.toDegrees(centreRad - halfArcRad) + "° to " + Math.toDegrees(centreRad + halfArcRad) + "°");
        }
        if (hands != 1 && hands != 2) {
            throw new IllegalArgumentException("hands must be 1 or 2, was " + hands);
        }
        Checks.inRange("reach factor", reach, MIN_REACH, 1.0);
        Checks.present("swing kind", kind);
    }

    /** A pattern given in degrees at the edge of the system: centre in [−180, 180]°, half-arc in (0, 180]°. */
    public static SwingPattern ofDegrees(double centreDeg, double halfArcDeg, int hands, double reach,
                                         SwingKind kind, boolean hipDriven) {
        Checks.inRange("pattern centre (°)", centreDeg, -180.0, 180.0);
        Checks.aboveAtMost("half-arc (°)", halfArcDeg, 0.0, 180.0);
        return new SwingPattern(Math.toRadians(centreDeg), Math.toRadians(halfArcDeg), hands, reach, kind,
                hipDriven);
    }

    /** Share s = 1/n of the club each arm carries. */
    public double share() {
        return 1.0 / hands;
    }

    /** Highest arm angle reached, θ_c + A, rad (the range-of-motion check C4). */
    public double highestAngleRad() {
        return centreRad + halfArcRad;
    }

    /** This pattern with another half-arc (used to report the largest half-arc the range of motion permits). */
    public SwingPattern withHalfArc(double newHalfArcRad) {
        return new SwingPattern(centreRad, newHalfArcRad, hands, reach, kind, hipDriven);
    }
}
