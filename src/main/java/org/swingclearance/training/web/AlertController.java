package org.swingclearance.training.web;

import jakarta.validation.Valid;
import java.util.UUID;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.training.SessionLogs;

/**
 * The clinician acknowledges a training alert from the home page, the patient page or the training log, and
 * returns there. The return target is one of three fixed places, never an address from the request.
 */
@Controller
@PreAuthorize("hasRole('CLINICIAN')")
class AlertController {

    private final SessionLogs sessions;

    AlertController(SessionLogs sessions) {
        this.sessions = sessions;
    }

    @PostMapping("/training/alerts/{alertId}/acknowledge")
    String acknowledge(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID alertId,
                       @Valid @ModelAttribute("ackForm") AcknowledgeForm form, BindingResult errors,
                       @RequestParam(defaultValue = "log") String from,
                       @RequestParam(required = false) UUID patientId, RedirectAttributes redirect) {
        if (errors.hasErrors()) {
            redirect.addFlashAttribute("flash", "alerts.ackRefused");
            return "redirect:/";
        }
        UUID episodeId = sessions.acknowledge(me.staff(), alertId, form.getVersion(), form.getNote());
        redirect.addFlashAttribute("flash", "alerts.acknowledged");
        return switch (from) {
            case "home" -> "redirect:/";
            case "patient" -> patientId == null ? "redirect:/" : "redirect:/patients/" + patientId;
            default -> "redirect:/training/episodes/" + episodeId;
        };
    }
}
