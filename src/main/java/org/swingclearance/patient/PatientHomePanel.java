package org.swingclearance.patient;

import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.HomePanel;
import org.swingclearance.identity.StaffRole;

/** The clinician's home: the clinic's patients, first page. */
@Component
class PatientHomePanel implements HomePanel {

    private final Patients patients;

    PatientHomePanel(Patients patients) {
        this.patients = patients;
    }

    @Override
    public boolean shows(CurrentStaff staff) {
        return staff.is(StaffRole.CLINICIAN);
    }

    @Override
    public int order() {
        return 10;
    }

    @Override
    public String template() {
        return "patients/home-panel";
    }

    @Override
    public Object data(CurrentStaff staff) {
        return patients.search(staff, "", 0).getContent();
    }
}
