package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Objects;

/**
 * A raw measure a derived value needs, and on which side relative to the involved side.
 *
 * @param measure never null
 * @param role    which side(s); never null; {@link Role#NONE} exactly for unsided measures
 */
public record InputRef(Measure measure, Role role) {

    /** Which side of a measure is needed. */
    public enum Role {
        /** The measure has no side. */
        NONE,
        INVOLVED,
        UNINVOLVED,
        /** Left and right, whichever is involved. */
        BOTH,
        /** The left side, whichever is involved. */
        LEFT,
        /** The right side, whichever is involved. */
        RIGHT
    }

    public InputRef {
        Objects.requireNonNull(measure, "measure");
        Objects.requireNonNull(role, "role");
        if (measure.sided() == (role == Role.NONE)) {
            throw new IllegalArgumentException(measure + " cannot be needed with role " + role);
        }
    }

    static InputRef unsided(Measure measure) {
        return new InputRef(measure, Role.NONE);
    }

    static InputRef involved(Measure measure) {
        return new InputRef(measure, Role.INVOLVED);
    }

    static InputRef both(Measure measure) {
        return new InputRef(measure, Role.BOTH);
    }

    static InputRef left(Measure measure) {
        return new InputRef(measure, Role.LEFT);
    }

    static InputRef right(Measure measure) {
        return new InputRef(measure, Role.RIGHT);
    }

    /**
     * The measurement slots this reference stands for.
     *
     * @param involvedSide the involved side, or null when none was given (then sided roles stand for both sides)
     */
    public List<MeasureKey> resolve(Side involvedSide) {
        return switch (role) {
            case NONE -> List.of(measure.key());
            case INVOLVED -> involvedSide == null ? bothSides() : List.of(measure.on(involvedSide));
            case UNINVOLVED -> involvedSide == null ? bothSides() : List.of(measure.on(involvedSide.opposite()));
            case BOTH -> bothSides();
            case LEFT -> List.of(measure.on(Side.LEFT));
            case RIGHT -> List.of(measure.on(Side.RIGHT));
        };
    }

    private List<MeasureKey> bothSides() {
        return List.of(measure.on(Side.LEFT), measure.on(Side.RIGHT));
    }
}
