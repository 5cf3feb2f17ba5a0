package org.swingclearance.plan;

import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.UUID;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.EpisodeSummary;
import tools.jackson.databind.MapperFeature;
import tools.jackson.databind.json.JsonMapper;

/**
 * Computes a draft version: gathers its sources (latest signed screening, practice rules, clubs, pattern), checks
 * the clinician's target against the grid, runs the engine and stores the steps, the outcome sentence and the inputs
 * snapshot on the draft. Runs inside the {@link Plans} service's transactions.
 */
@Component
class PlanDrafting {

    /** Sorted keys, so that the same inputs always give the same snapshot text (and plan fingerprint). */
    private static final JsonMapper JSON = JsonMapper.builder().enable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
            .build();

    private final PlanInputsAssembler assembler;
    private final MessageSource messages;

    PlanDrafting(PlanInputsAssembler assembler, MessageSource messages) {
        this.assembler = assembler;
        this.messages = messages;
    }

    /**
     * Applies the settings to the draft and computes it from the latest sources. The outcome sentence is stored in
     * words as the clinician saw it: an issued version keeps it even if the wording of the messages changes later.
     */
    void compute(CurrentStaff clinician, EpisodeSummary episode, PlanVersion draft, PlanSettings settings) {
        PlanSources sources = assembler.assemble(clinician, episode, settings.patternId());
        TargetCheck.check(settings.target(), sources.inputs());
        PlanSettings complete = withAllBands(settings, sources);
        draft.applySettings(complete, sources.inputs().pattern().name());
        draft.recordSources(sources.screeningId(), sources.screeningVersion(), sources.rulesVersion(),
                sources.inputs().band(), sources.stepLimit(), sources.painDuringLimit());
        PlanComputation.Computed computed = PlanComputation.compute(sources.inputs(), complete,
                draft.getAdjustments(), sources.stepLimit(), sources.painDuringLimit());
        draft.recordComputation(PlanComputation.ENGINE_VERSION, JSON.writeValueAsString(sources.inputs()),
                computed.steps(), computed.outcomeKey(), messages.getMessage(computed.outcome(), Locale.ENGLISH));
    }

    /** Settings for a first draft: no target, sessions of the practice rules' doses, starting on {@code startsOn}. */
    PlanSettings defaults(CurrentStaff clinician, UUID patternId, LocalDate startsOn) {
        return new PlanSettings(patternId, null, false, StepUnit.SESSIONS, 3, 3, startsOn,
                assembler.defaultDoses(clinician));
    }

    /** Every plannable band has a dose: missing ones (a form that left a band out) take the practice-rule default. */
    private static PlanSettings withAllBands(PlanSettings s, PlanSources sources) {
        Map<String, Dose> doses = new LinkedHashMap<>(sources.defaultDoses());
        doses.putAll(s.doses());
        return new PlanSettings(s.patternId(), s.target(), s.continueProvisionally(), s.stepUnit(), s.stepLength(),
                s.sessionsPerWeek(), s.startsOn(), doses);
    }
}
