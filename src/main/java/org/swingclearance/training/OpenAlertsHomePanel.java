package org.swingclearance.training;

import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.HomePanel;
import org.swingclearance.identity.StaffRole;

/** The clinician's home: the clinic's open training alerts, each with acknowledge and re-plan. */
@Component
class OpenAlertsHomePanel implements HomePanel {

    private final SessionLogs sessions;

    OpenAlertsHomePanel(SessionLogs sessions) {
        this.sessions = sessions;
    }

    @Override
    public boolean shows(CurrentStaff staff) {
        return staff.is(StaffRole.CLINICIAN);
    }

    @Override
    public int order() {
        return 5;
    }

    @Override
    public String template() {
        return "training/home-alerts";
    }

    @Override
    public Object data(CurrentStaff staff) {
        return sessions.openAlerts(staff);
    }
}
