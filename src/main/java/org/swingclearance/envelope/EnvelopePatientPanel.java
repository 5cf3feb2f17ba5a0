package org.swingclearance.envelope;

import java.util.List;
import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.PatientPage;
import org.swingclearance.patient.PatientPanel;

/** The patient page's links to each episode's envelope page. */
@Component
class EnvelopePatientPanel implements PatientPanel {

    @Override
    public int order() {
        return 40;
    }

    @Override
    public String template() {
        return "envelope/patient-panel";
    }

    @Override
    public List<EpisodeSummary> data(CurrentStaff staff, PatientPage page) {
        return page.episodes();
    }
}
