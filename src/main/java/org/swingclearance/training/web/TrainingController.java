package org.swingclearance.training.web;

import jakarta.validation.Valid;
import java.util.UUID;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.security.core.annotation.AuthenticationPrincipal;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.training.SessionEntryRejected;
import org.swingclearance.training.SessionHistory;
import org.swingclearance.training.SessionLogs;
import org.swingclearance.training.TrainingPlan;
import org.swingclearance.training.Workspace;
import org.swingclearance.web.InvalidStateException;

/**
 * The training log of an episode: the page with sessions, alerts and load charts, and the forms to log a session,
 * correct one and add the next-morning pain. Trainers reach only episodes whose plan is shared with them.
 */
@Controller
@RequestMapping("/training/episodes/{episodeId}")
@PreAuthorize("hasAnyRole('TRAINER', 'CLINICIAN')")
class TrainingController {

    static final String WORKSPACE = "training/workspace";
    static final String LOG_FORM = "training/log-form";
    static final String CORRECT_FORM = "training/correct-form";
    static final String MORNING_FORM = "training/morning-form";

    private final SessionLogs sessions;
    private final ChartData charts;

    TrainingController(SessionLogs sessions, ChartData charts) {
        this.sessions = sessions;
        this.charts = charts;
    }

    @GetMapping
    String workspace(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId, Model model) {
        Workspace workspace = sessions.workspace(me.staff(), episodeId);
        model.addAttribute("ws", workspace);
        model.addAttribute("chartData", charts.of(workspace));
        return WORKSPACE;
    }

    @GetMapping("/sessions/new")
    String newSession(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId, Model model,
                      RedirectAttributes redirect) {
        try {
            TrainingPlan plan = sessions.planForLogging(me.staff(), episodeId);
            model.addAttribute("form", SessionLogForm.forDay(sessions.today(), plan.currentStepOn(sessions.today())));
            return logForm(plan, model);
        } catch (InvalidStateException e) {
            return backToLog(episodeId, e, redirect);
        }
    }

    @PostMapping("/sessions")
    String logSession(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId,
                      @Valid @ModelAttribute("form") SessionLogForm form, BindingResult errors, Model model,
                      RedirectAttributes redirect) {
        CurrentStaff staff = me.staff();
        try {
            if (errors.hasErrors()) {
                return logForm(sessions.planForLogging(staff, episodeId), model);
            }
            sessions.log(staff, episodeId, form.toEntry());
        } catch (SessionEntryRejected e) {
            e.violations().forEach(v -> errors.rejectValue(v.field(), v.code()));
            return logForm(sessions.planForLogging(staff, episodeId), model);
        } catch (InvalidStateException e) {
            return backToLog(episodeId, e, redirect);
        }
        redirect.addFlashAttribute("flash", "sessionLog.saved");
        return "redirect:/training/episodes/" + episodeId;
    }

    @GetMapping("/sessions/{logId}/correct")
    String correctForm(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId,
                       @PathVariable UUID logId, Model model, RedirectAttributes redirect) {
        SessionHistory history = sessions.session(me.staff(), episodeId, logId);
        try {
            model.addAttribute("form", CorrectionForm.from(history.latest()));
            return correctionPage(history, model);
        } catch (InvalidStateException e) {
            return backToLog(episodeId, e, redirect);
        }
    }

    @PostMapping("/sessions/{logId}/correct")
    String correct(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId, @PathVariable UUID logId,
                   @Valid @ModelAttribute("form") CorrectionForm form, BindingResult errors, Model model,
                   RedirectAttributes redirect) {
        CurrentStaff staff = me.staff();
        try {
            if (errors.hasErrors()) {
                return correctionPage(sessions.session(staff, episodeId, logId), model);
            }
            sessions.correct(staff, episodeId, logId, form.getVersion(), form.toEntry(), form.getReason());
        } catch (SessionEntryRejected e) {
            e.violations().forEach(v -> errors.rejectValue(v.field(), v.code()));
            return correctionPage(sessions.session(staff, episodeId, logId), model);
        } catch (InvalidStateException e) {
            return backToLog(episodeId, e, redirect);
        }
        redirect.addFlashAttribute("flash", "sessionLog.corrected");
        return "redirect:/training/episodes/" + episodeId;
    }

    @GetMapping("/sessions/{logId}/morning")
    String morningForm(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId,
                       @PathVariable UUID logId, Model model) {
        SessionHistory history = sessions.session(me.staff(), episodeId, logId);
        MorningPainForm form = new MorningPainForm();
        form.setVersion(history.latest().morningVersion());
        form.setPain(history.latest().painNextMorning());
        model.addAttribute("form", form);
        return morningPage(history, model);
    }

    @PostMapping("/sessions/{logId}/morning")
    String recordMorning(@AuthenticationPrincipal StaffPrincipal me, @PathVariable UUID episodeId,
                         @PathVariable UUID logId, @Valid @ModelAttribute("form") MorningPainForm form,
                         BindingResult errors, Model model, RedirectAttributes redirect) {
        CurrentStaff staff = me.staff();
        if (errors.hasErrors()) {
            return morningPage(sessions.session(staff, episodeId, logId), model);
        }
        try {
            sessions.recordMorningPain(staff, episodeId, logId, form.getVersion(), form.getPain(), form.getReason());
        } catch (SessionEntryRejected e) {
            e.violations().forEach(v -> errors.rejectValue(v.field(), v.code()));
            return morningPage(sessions.session(staff, episodeId, logId), model);
        } catch (InvalidStateException e) {
            return backToLog(episodeId, e, redirect);
        }
        redirect.addFlashAttribute("flash", "morningPain.saved");
        return "redirect:/training/episodes/" + episodeId;
    }

    private String logForm(TrainingPlan plan, Model model) {
        model.addAttribute("plan", plan);
        model.addAttribute("today", sessions.today());
        return LOG_FORM;
    }

    private String correctionPage(SessionHistory history, Model model) {
        if (history.plan() == null) {
            throw new InvalidStateException("training.noPlan");
        }
        model.addAttribute("history", history);
        model.addAttribute("plan", history.plan());
        model.addAttribute("today", sessions.today());
        return CORRECT_FORM;
    }

    private String morningPage(SessionHistory history, Model model) {
        model.addAttribute("history", history);
        model.addAttribute("today", sessions.today());
        return MORNING_FORM;
    }

    private static String backToLog(UUID episodeId, InvalidStateException e, RedirectAttributes redirect) {
        redirect.addFlashAttribute("flash", e.messageKey());
        return "redirect:/training/episodes/" + episodeId;
    }
}
