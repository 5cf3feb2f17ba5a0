package org.swingclearance.equipment;

/**
 * Club measurements that cannot be right together (a balance point beyond the club, a pendulum timing that gives
 * no positive inertia). Names the form field to mark and a message saying which measurement to repeat.
 */
public class MeasurementRejected extends RuntimeException {

    private final String field;
    private final String messageKey;
    private final transient Object[] args;

    public MeasurementRejected(String field, String messageKey, Object... args) {
        super(messageKey + " on " + field);
        this.field = field;
        this.messageKey = messageKey;
        this.args = args;
    }

    public String field() {
        return field;
    }

    public String messageKey() {
        return messageKey;
    }

    public Object[] args() {
        return args;
    }
}
