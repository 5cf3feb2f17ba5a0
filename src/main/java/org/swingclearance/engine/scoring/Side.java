package org.swingclearance.engine.scoring;

/** Body side of a measurement. */
public enum Side {
    LEFT,
    RIGHT;

    /** The other side; never null. */
    public Side opposite() {
        return this == LEFT ? RIGHT : LEFT;
    }
}
