package org.swingclearance.plan;

/**
 * A plan setting that cannot be used, with the form field it belongs to and a message key with arguments: the page
 * shows it beside the field and nothing is saved (a target off the grid is explained, never rounded).
 */
public class PlanSettingsRejected extends RuntimeException {

    private final String field;
    private final String messageKey;
    private final transient Object[] args;

    public PlanSettingsRejected(String field, String messageKey, Object... args) {
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
