package org.swingclearance.audit;

import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.HomePanel;
import org.swingclearance.identity.StaffRole;

/** The manager's home: the state of the clinic's audit chain, with a way into the trail. */
@Component
class AuditHomePanel implements HomePanel {

    private final AuditOversight oversight;

    AuditHomePanel(AuditOversight oversight) {
        this.oversight = oversight;
    }

    @Override
    public boolean shows(CurrentStaff staff) {
        return staff.is(StaffRole.MANAGER);
    }

    @Override
    public int order() {
        return 50;
    }

    @Override
    public String template() {
        return "audit/home-panel";
    }

    @Override
    public Object data(CurrentStaff staff) {
        return oversight.status(staff);
    }
}
