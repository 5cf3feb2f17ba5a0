package org.swingclearance.identity.web;

import java.util.Comparator;
import java.util.List;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.swingclearance.identity.HomePanel;
import org.swingclearance.identity.StaffPrincipal;

/** The home page of each role, assembled from the panels the features contribute. */
@Controller
class HomeController {

    static final String VIEW = "identity/home";

    private final List<HomePanel> panels;

    HomeController(List<HomePanel> panels) {
        this.panels = panels.stream().sorted(Comparator.comparingInt(HomePanel::order)).toList();
    }

    @GetMapping("/")
    String home(@AuthenticationPrincipal StaffPrincipal principal, Model model) {
        var staff = principal.staff();
        model.addAttribute("sections", panels.stream().filter(p -> p.shows(staff))
                .map(p -> new Section(p.template(), p.data(staff))).toList());
        return VIEW;
    }

    /** One rendered panel: its fragment's template and the data it receives. */
    public record Section(String template, Object data) {
    }
}
