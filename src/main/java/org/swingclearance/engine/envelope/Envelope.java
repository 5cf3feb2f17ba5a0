package org.swingclearance.engine.envelope;

import java.util.List;
import org.swingclearance.engine.mechanics.Assessment;

/**
 * The permitted limits of one club and pattern for one patient (engine.md §6), with the configuration they were
 * inverted around.
 *
 * @param atConfiguration the assessment of the configuration as given (inputs, demand, ratios, binding)
 * @param furthestGrip    furthest grip from the head at the given cycle time
 * @param shortestCycle   shortest cycle time at the given grip mark
 * @param heaviestMass    heaviest club of this shape at the given grip mark and cycle time
 * @param maxHalfArcRad   when the range of motion excludes the pattern, the largest half-arc it permits, rad;
 *                        otherwise null
 * @param assumptions     how the limits were found, as plain sentences (the demand's model assumptions are in
 *                        {@code atConfiguration})
 * @param engineVersion   the engine version
 */
public record Envelope(Assessment atConfiguration, GripLimit furthestGrip, CycleTimeLimit shortestCycle,
                       MassLimit heaviestMass, Double maxHalfArcRad, List<String> assumptions,
                       String engineVersion) {

    public Envelope {
        assumptions = List.copyOf(assumptions);
    }
}
