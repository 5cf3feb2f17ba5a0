package org.swingclearance.engine.scoring;

import java.util.Objects;

/**
 * One measurement slot of a screening: a measure and, for sided measures, the side.
 *
 * @param measure never null
 * @param side    the side for a sided measure; null exactly when the measure is not sided
 */
public record MeasureKey(Measure measure, Side side) {

    public MeasureKey {
        Objects.requireNonNull(measure, "measure");
        if (measure.sided() != (side != null)) {
            throw new IllegalArgumentException(measure + (measure.sided() ? " needs a side" : " has no side"));
        }
    }

    @Override
    public String toString() {
        return side == null ? measure.name() : measure.name() + ":" + side.name();
    }
}
