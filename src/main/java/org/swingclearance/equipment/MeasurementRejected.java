package org.swingclearance.equipment;

import org.swingclearance.web.FieldRejectedException;

/**
 * Club measurements that cannot be right together (a balance point beyond the club, a pendulum timing that gives
 * no positive inertia). Names the form field to mark and a message saying which measurement to repeat.
 */
public class MeasurementRejected extends FieldRejectedException {

    public MeasurementRejected(String field, String messageKey, Object... args) {
        super(field, messageKey, args);
    }
}
