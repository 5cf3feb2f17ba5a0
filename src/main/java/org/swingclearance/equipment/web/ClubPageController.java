package org.swingclearance.equipment.web;

import java.util.UUID;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.identity.StaffPrincipal;

/**
 * The read-only page of one club, for every role of the club's clinic: trainers included, because the plan
 * feature links a plan step's club here. Clubs are clinic equipment, not patient data, so a trainer may read any
 * club of their own clinic; another clinic's club is a 404.
 */
@Controller
@PreAuthorize("hasAnyRole('CLINICIAN', 'MANAGER', 'ADMIN', 'TRAINER')")
class ClubPageController {

    static final String DETAIL = "equipment/club";

    private final Clubs clubs;

    ClubPageController(Clubs clubs) {
        this.clubs = clubs;
    }

    @GetMapping("/clubs/{id}")
    String detail(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID id, Model model) {
        model.addAttribute("page", clubs.page(me.staff(), id));
        return DETAIL;
    }
}
