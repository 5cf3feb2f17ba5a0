package org.swingclearance.screening;

import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.HomePanel;
import org.swingclearance.identity.StaffRole;

/** The clinician's home: the clinic's screenings that are still drafts. */
@Component
class DraftScreeningsHomePanel implements HomePanel {

    private final Screenings screenings;

    DraftScreeningsHomePanel(Screenings screenings) {
        this.screenings = screenings;
    }

    @Override
    public boolean shows(CurrentStaff staff) {
        return staff.is(StaffRole.CLINICIAN);
    }

    @Override
    public int order() {
        return 20;
    }

    @Override
    public String template() {
        return "screening/home-panel";
    }

    @Override
    public Object data(CurrentStaff staff) {
        return screenings.drafts(staff);
    }
}
