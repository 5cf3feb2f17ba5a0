package org.swingclearance.plan;

import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.HomePanel;
import org.swingclearance.identity.StaffRole;

/** The trainer's home: the plans shared with me, this week's step of each, and the handout. */
@Component
class TrainerPlansPanel implements HomePanel {

    private final Plans plans;

    TrainerPlansPanel(Plans plans) {
        this.plans = plans;
    }

    @Override
    public boolean shows(CurrentStaff staff) {
        return staff.is(StaffRole.TRAINER);
    }

    @Override
    public int order() {
        return 10;
    }

    @Override
    public String template() {
        return "plan/home-panel";
    }

    @Override
    public Object data(CurrentStaff staff) {
        return plans.sharedWith(staff);
    }
}
