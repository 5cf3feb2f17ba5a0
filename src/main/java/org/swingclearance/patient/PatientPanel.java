package org.swingclearance.patient;

import org.swingclearance.identity.CurrentStaff;

/**
 * A section of the patient page contributed by another feature (screening history, plans, alerts), as a bean:
 * the fragment {@code <template> :: panel(data)} is rendered with what {@link #data} returns. Contributing a
 * panel never edits the patient page itself.
 */
public interface PatientPanel {

    int order();

    String template();

    /** The panel's data for the patient; called inside the request, after the patient read was audited. */
    Object data(CurrentStaff staff, PatientPage page);
}
