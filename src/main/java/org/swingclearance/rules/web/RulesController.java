package org.swingclearance.rules.web;

import jakarta.validation.Valid;
import java.util.List;
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
import org.swingclearance.engine.evidence.Confidence;
import org.swingclearance.engine.evidence.EvidenceTag;
import org.swingclearance.engine.rules.Comparison;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.rules.Region;
import org.swingclearance.engine.scoring.Spadi;
import org.swingclearance.engine.scoring.ValueKey;
import org.swingclearance.identity.StaffPrincipal;
import org.swingclearance.rules.CurrentRuleSet;
import org.swingclearance.rules.PracticeRules;
import org.swingclearance.rules.RuleSetSettings;

/**
 * The clinic's practice rules: managers and admins view and edit them (each save is a new version); clinicians may
 * read them, since every finding on a screening names the rule and version it came from.
 */
@Controller
@RequestMapping("/rules")
class RulesController {

    static final String VIEW = "rules/view";
    static final String FORM = "rules/form";

    /** Evidence tags a practice rule may carry (never "physics"). */
    private static final List<EvidenceTag> RULE_TAGS = List.of(EvidenceTag.VERIFIED, EvidenceTag.SECONDARY,
            EvidenceTag.FROM_MEMORY, EvidenceTag.COMMON_PRACTICE);

    private final PracticeRules rules;

    RulesController(PracticeRules rules) {
        this.rules = rules;
    }

    @ModelAttribute
    void referenceData(Model model) {
        model.addAttribute("bandOptions", LoadBand.values());
        model.addAttribute("regionOptions", Region.values());
        model.addAttribute("comparisonOptions", Comparison.values());
        model.addAttribute("valueKeyOptions", ValueKey.values());
        model.addAttribute("tagOptions", RULE_TAGS);
        model.addAttribute("confidenceOptions", Confidence.values());
        model.addAttribute("spadiMethods", Spadi.TotalMethod.values());
    }

    @GetMapping
    @PreAuthorize("hasAnyRole('MANAGER', 'ADMIN', 'CLINICIAN')")
    String current(@AuthenticationPrincipal StaffPrincipal me, Model model) {
        return show(me, rules.current(me.staff().clinicId()), model);
    }

    @GetMapping("/versions/{version}")
    @PreAuthorize("hasAnyRole('MANAGER', 'ADMIN', 'CLINICIAN')")
    String version(@AuthenticationPrincipal StaffPrincipal me, @PathVariable int version, Model model) {
        return show(me, rules.version(me.staff(), version), model);
    }

    @GetMapping("/edit")
    @PreAuthorize("hasAnyRole('MANAGER', 'ADMIN')")
    String edit(@AuthenticationPrincipal StaffPrincipal me, Model model) {
        model.addAttribute("form", RuleSetForm.of(rules.current(me.staff().clinicId())));
        return FORM;
    }

    @PostMapping
    @PreAuthorize("hasAnyRole('MANAGER', 'ADMIN')")
    String save(@AuthenticationPrincipal StaffPrincipal me, @Valid @ModelAttribute("form") RuleSetForm form,
                BindingResult errors, RedirectAttributes redirect) {
        RuleSetSettings settings = errors.hasErrors() ? null : RuleSetFormReader.read(form, errors);
        if (settings == null) {
            if (!errors.hasGlobalErrors()) {
                errors.reject("rules.error.fix");
            }
            return FORM;
        }
        int version = rules.edit(me.staff(), form.getBasedOnVersion(), settings, form.getChangeNote());
        redirect.addFlashAttribute("flash", "rules.saved");
        redirect.addFlashAttribute("savedVersion", version);
        return "redirect:/rules";
    }

    private String show(StaffPrincipal me, CurrentRuleSet shown, Model model) {
        model.addAttribute("ruleSet", shown);
        model.addAttribute("history", rules.history(me.staff()));
        model.addAttribute("isLatest", shown.version() == rules.current(me.staff().clinicId()).version());
        return VIEW;
    }
}
