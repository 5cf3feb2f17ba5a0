package org.swingclearance.plan;

import org.swingclearance.web.FieldRejectedException;

/**
 * A plan setting that cannot be used, with the form field it belongs to and a message key with arguments: the page
 * shows it beside the field and nothing is saved (a target off the grid is explained, never rounded).
 */
public class PlanSettingsRejected extends FieldRejectedException {

    public PlanSettingsRejected(String field, String messageKey, Object... args) {
        super(field, messageKey, args);
    }
}
