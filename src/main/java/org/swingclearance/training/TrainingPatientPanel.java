package org.swingclearance.training;

import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.PatientPage;
import org.swingclearance.patient.PatientPanel;

/** The patient page's training section: a link to each episode's training log and the patient's alerts. */
@Component
class TrainingPatientPanel implements PatientPanel {

    private final SessionLogs sessions;

    TrainingPatientPanel(SessionLogs sessions) {
        this.sessions = sessions;
    }

    @Override
    public int order() {
        return 70;
    }

    @Override
    public String template() {
        return "training/patient-panel";
    }

    @Override
    public Object data(CurrentStaff staff, PatientPage page) {
        return sessions.patientTraining(staff, page.patient().id());
    }
}
