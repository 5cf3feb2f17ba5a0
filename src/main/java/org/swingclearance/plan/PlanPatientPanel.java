package org.swingclearance.plan;

import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.PatientPage;
import org.swingclearance.patient.PatientPanel;

/** The patient page's plan section: each episode's plan at a glance, with a link to its plan page. */
@Component
class PlanPatientPanel implements PatientPanel {

    private final Plans plans;

    PlanPatientPanel(Plans plans) {
        this.plans = plans;
    }

    @Override
    public int order() {
        return 40;
    }

    @Override
    public String template() {
        return "plan/patient-panel";
    }

    @Override
    public Object data(CurrentStaff staff, PatientPage page) {
        return plans.summaries(staff, page.episodes());
    }
}
