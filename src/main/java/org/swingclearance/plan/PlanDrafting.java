package org.swingclearance.plan;

import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.UUID;
import org.springframework.context.MessageSource;
import org.springframework.context.MessageSourceResolvable;
import org.springframework.context.support.DefaultMessageSourceResolvable;
import org.springframework.stereotype.Component;
import org.swingclearance.envelope.EnvelopeRow;
import org.swingclearance.envelope.EnvelopeSnapshotView;
import org.swingclearance.envelope.Envelopes;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.EpisodeSummary;
import tools.jackson.databind.MapperFeature;
import tools.jackson.databind.json.JsonMapper;

/**
 * Computes a draft version: gathers its sources (latest signed screening, practice rules, clubs, pattern), checks
 * the clinician's target against the grid, runs the engine and stores the steps, the outcome sentence, the inputs
 * snapshot and the envelope snapshot of the same screening (Contract E) on the draft. A target outside the envelope
 * is explained with what the envelope permits for its club. Runs inside the {@link Plans} service's transactions.
 */
@Component
class PlanDrafting {

    /** Sorted keys, so that the same inputs always give the same snapshot text (and plan fingerprint). */
    private static final JsonMapper JSON = JsonMapper.builder().enable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
            .build();

    /** Outcomes that mean the target itself lies outside the band the plan may use. */
    private static final Set<String> TARGET_OUTSIDE = Set.of("engine.plan.shortfall.OUTSIDE_ENVELOPE",
            "engine.plan.shortfall.NEEDS_RESCREEN");

    private final PlanInputsAssembler assembler;
    private final Envelopes envelopes;
    private final MessageSource messages;

    PlanDrafting(PlanInputsAssembler assembler, Envelopes envelopes, MessageSource messages) {
        this.assembler = assembler;
        this.envelopes = envelopes;
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
        Optional<EnvelopeSnapshotView> envelope = envelopes.latest(clinician, episode.id())
                .filter(e -> e.screeningId().equals(sources.screeningId())
                        && e.screeningVersion() == sources.screeningVersion());
        String outcome = messages.getMessage(computed.outcome(), Locale.ENGLISH);
        if (complete.target() != null && TARGET_OUTSIDE.contains(computed.outcomeKey())) {
            outcome = outcome + envelope.flatMap(e -> e.row(complete.target().clubId(), complete.patternId())
                            .map(row -> " " + messages.getMessage(envelopeHint(row, e.cycleTimeS()), Locale.ENGLISH)))
                    .orElse("");
        }
        draft.recordComputation(PlanComputation.ENGINE_VERSION, JSON.writeValueAsString(sources.inputs()),
                envelope.map(EnvelopeSnapshotView::id).orElse(null), computed.steps(), computed.outcomeKey(), outcome);
    }

    /**
     * What the stored envelope (the limits the clinician reviews on the envelope page) says of the target's club in
     * this pattern: its furthest grip from the head and shortest cycle time, or the constraint that blocks them.
     */
    private static MessageSourceResolvable envelopeHint(EnvelopeRow row, double usualCycleTimeS) {
        if (!row.computed() || row.furthestGripCm() == null || row.shortestCycleTimeS() == null) {
            return new DefaultMessageSourceResolvable(new String[] {"plan.outcome.envelopeBlocked"},
                    new Object[] {row.clubName()});
        }
        return new DefaultMessageSourceResolvable(new String[] {"plan.outcome.envelopeHint"}, new Object[] {
            row.clubName(), String.format(Locale.ROOT, "%.1f", row.furthestGripCm()),
            String.format(Locale.ROOT, "%.2f", row.shortestCycleTimeS()),
            String.format(Locale.ROOT, "%.1f", row.usualGripCm()),
            String.format(Locale.ROOT, "%.1f", usualCycleTimeS)});
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
