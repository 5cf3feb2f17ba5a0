package org.swingclearance.web;

/**
 * Input that is well-formed but cannot be used, tied to one form field: the page marks that field with the message
 * key and its arguments, and nothing is saved. Features name their own subclasses (club measurements, plan settings).
 */
public class FieldRejectedException extends RuntimeException {

    private final String field;
    private final String messageKey;
    private final transient Object[] args;

    public FieldRejectedException(String field, String messageKey, Object... args) {
        super(field + ": " + messageKey);
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
