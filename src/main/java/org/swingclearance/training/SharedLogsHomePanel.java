package org.swingclearance.training;

import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.HomePanel;
import org.swingclearance.identity.StaffRole;

/** The trainer's home: a training log per shared plan, with today's step and any "go back to step N" advice. */
@Component
class SharedLogsHomePanel implements HomePanel {

    private final SessionLogs sessions;

    SharedLogsHomePanel(SessionLogs sessions) {
        this.sessions = sessions;
    }

    @Override
    public boolean shows(CurrentStaff staff) {
        return staff.is(StaffRole.TRAINER);
    }

    @Override
    public int order() {
        return 5;
    }

    @Override
    public String template() {
        return "training/home-trainer";
    }

    @Override
    public Object data(CurrentStaff staff) {
        return sessions.sharedLogs(staff);
    }
}
