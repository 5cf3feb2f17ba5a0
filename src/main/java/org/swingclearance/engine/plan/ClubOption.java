package org.swingclearance.engine.plan;

/**
 * One club of the clinic inventory as the plan search sees it: its identity, its mass (which orders the clubs) and
 * its handle length x_h, the furthest grip mark from the knob end.
 */
public record ClubOption(String id, double massKg, double handleLengthM) {

    public ClubOption {
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("A club needs an id.");
        }
        if (!(massKg > 0) || !Double.isFinite(massKg)) {
            throw new IllegalArgumentException("Club " + id + ": mass must be a positive number of kg, was " + massKg);
        }
        if (!(handleLengthM >= 0) || !Double.isFinite(handleLengthM)) {
            throw new IllegalArgumentException(
                    "Club " + id + ": handle length must be zero or more metres, was " + handleLengthM);
        }
    }
}
