package org.swingclearance.equipment;

/**
 * What the clinician timed: the club hung from a pivot at {@code pivotFromBalancePointM} from its balance point,
 * {@code swings} full out-and-back swings in {@code seconds}.
 */
public record PendulumReading(double pivotFromBalancePointM, int swings, double seconds) {

    /** Seconds per full swing. */
    public double periodS() {
        return seconds / swings;
    }
}
