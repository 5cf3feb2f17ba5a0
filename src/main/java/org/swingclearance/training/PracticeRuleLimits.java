package org.swingclearance.training;

import java.util.UUID;
import org.springframework.stereotype.Component;
import org.swingclearance.rules.CurrentRuleSet;
import org.swingclearance.rules.PracticeRules;

/** The alert limits from the clinic's current practice rules (the rules feature's Contract R). */
@Component
class PracticeRuleLimits implements AlertLimitSource {

    private final PracticeRules rules;

    PracticeRuleLimits(PracticeRules rules) {
        this.rules = rules;
    }

    @Override
    public AlertLimits current(UUID clinicId) {
        CurrentRuleSet current = rules.current(clinicId);
        return new AlertLimits(current.version(), current.painDuringLimit(), current.acwrCaution());
    }
}
