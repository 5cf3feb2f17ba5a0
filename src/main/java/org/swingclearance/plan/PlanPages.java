package org.swingclearance.plan;

import java.time.Clock;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.UUID;
import org.springframework.stereotype.Component;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.equipment.SwingPatternView;
import org.swingclearance.equipment.SwingPatterns;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.Patients;

/** Assembles the clinician's plan page of an episode; runs inside the {@link Plans} service's transaction. */
@Component
class PlanPages {

    private final PlanVersionRepository versions;
    private final PlanInputsAssembler assembler;
    private final PlanDrafting drafting;
    private final PlanSharing sharing;
    private final PlanViews views;
    private final Patients patients;
    private final Clubs clubs;
    private final SwingPatterns patterns;
    private final Clock clock;

    PlanPages(PlanVersionRepository versions, PlanInputsAssembler assembler, PlanDrafting drafting,
              PlanSharing sharing, PlanViews views, Patients patients, Clubs clubs, SwingPatterns patterns,
              Clock clock) {
        this.versions = versions;
        this.assembler = assembler;
        this.drafting = drafting;
        this.sharing = sharing;
        this.views = views;
        this.patients = patients;
        this.clubs = clubs;
        this.patterns = patterns;
        this.clock = clock;
    }

    PlanPage page(CurrentStaff clinician, EpisodeSummary episode, GradedPlan plan) {
        String blocked = assembler.blocker(clinician, episode).orElse(null);
        List<SwingPatternView> library = patterns.all(clinician);
        // Default to the first pattern that is not hip-driven: it needs no lumbopelvic band (C5).
        UUID firstPattern = library.stream().filter(p -> !p.hipDriven()).findFirst()
                .or(() -> library.stream().findFirst()).map(SwingPatternView::id).orElse(null);
        PlanSettings defaults = drafting.defaults(clinician, firstPattern, LocalDate.now(clock));
        List<PlanVersionView> history = plan == null ? List.of()
                : versions.findByClinicIdAndPlanIdOrderByNumberDesc(clinician.clinicId(), plan.getId()).stream()
                        .map(v -> views.version(clinician, v)).toList();
        PlanVersionView draft = history.stream().filter(PlanVersionView::draft).findFirst().orElse(null);
        PlanVersionView issued = history.stream().filter(v -> !v.draft()).findFirst().orElse(null);
        List<ShareView> shares = plan == null ? List.of() : sharing.sharesOf(clinician, plan);
        return new PlanPage(episode, patients.find(clinician, episode.patientId()).orElseThrow(), blocked,
                plan == null ? null : plan.getId(), draft, issued, history, shares,
                plan == null ? List.of() : sharing.trainerOptions(clinician, plan, shares),
                plan == null ? List.of() : sharing.invitationsOf(clinician, plan), defaults, library,
                clubs.active(clinician), PlanComputation.ladder());
    }

    /** Whether the draft was computed from the episode's latest signed screening (same screening and version). */
    boolean restsOnLatestScreening(CurrentStaff clinician, EpisodeSummary episode, PlanVersion draft) {
        return assembler.latestScreening(clinician, episode.id())
                .filter(id -> id.equals(draft.getSourceScreeningId())).isPresent()
                && Objects.equals(assembler.latestScreeningVersion(clinician, episode.id()).orElse(null),
                        draft.getSourceScreeningVersion());
    }
}
