package org.swingclearance.equipment;

import java.util.UUID;

/**
 * A swing pattern as other features see it (Contract E). {@code name} is ready to show (a built-in's name is
 * resolved from the message bundle). Angles in degrees from the hanging arm, forward/up positive; {@code kind} is
 * RHYTHMIC or SINGLE_ARC; {@code minimumLumbopelvicBand} is a LoadBand name or null when none is needed.
 */
public record SwingPatternView(UUID id, String name, double centreDeg, double halfArcDeg, int hands, double reach,
                               String kind, boolean hipDriven, String minimumLumbopelvicBand, boolean builtIn) {

    /** Highest arm angle reached, centre + half-arc, degrees (what the range-of-motion check compares). */
    public double highestDeg() {
        return centreDeg + halfArcDeg;
    }

    /** Lowest arm angle reached, centre − half-arc, degrees. */
    public double lowestDeg() {
        return centreDeg - halfArcDeg;
    }
}
