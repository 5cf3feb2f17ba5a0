package org.swingclearance.web;

/**
 * A request that is well-formed but not allowed in the record's current state (signing an incomplete
 * screening, sharing without consent). Carries a message key so the page can explain why.
 */
public class InvalidStateException extends RuntimeException {

    private final String messageKey;
    private final transient Object[] args;

    public InvalidStateException(String messageKey, Object... args) {
        super(messageKey);
        this.messageKey = messageKey;
        this.args = args;
    }

    public String messageKey() {
        return messageKey;
    }

    public Object[] args() {
        return args;
    }
}
