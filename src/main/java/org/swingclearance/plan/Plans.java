package org.swingclearance.plan;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.UUID;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.identity.Clinic;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffAccounts;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.Patients;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * The plan feature's application service and Contract P: the clinician's plan lifecycle (issue, revise, discard),
 * sharing with trainers and invitations, the handout, and what a trainer may read of a plan shared with them.
 * Every method is scoped to the caller's clinic; a trainer reaches a plan only through an active share; every read
 * and change is audited in the same transaction, every refusal is a 404 audited on its own.
 */
@Service
public class Plans {

    private final GradedPlanRepository plans;
    private final PlanVersionRepository versions;
    private final PlanShareRepository shares;
    private final PlanAccess access;
    private final PlanSharing sharing;
    private final PlanDrafting drafting;
    private final PlanPages pages;
    private final PlanViews views;
    private final HandoutRenderer handouts;
    private final Patients patients;
    private final StaffAccounts staffAccounts;
    private final AuditLog audit;
    private final Clock clock;

    Plans(GradedPlanRepository plans, PlanVersionRepository versions, PlanShareRepository shares, PlanAccess access,
          PlanSharing sharing, PlanDrafting drafting, PlanPages pages, PlanViews views, HandoutRenderer handouts,
          Patients patients, StaffAccounts staffAccounts, AuditLog audit, Clock clock) {
        this.plans = plans;
        this.versions = versions;
        this.shares = shares;
        this.access = access;
        this.sharing = sharing;
        this.drafting = drafting;
        this.pages = pages;
        this.views = views;
        this.handouts = handouts;
        this.patients = patients;
        this.staffAccounts = staffAccounts;
        this.audit = audit;
        this.clock = clock;
    }

    // ---- The clinician's plan page and drafting ----

    /**
     * The plan page of an episode of the caller's clinic, audited on every render: as a read of the plan, or, before
     * there is one, of the episode (the page still shows the patient and the screening's state).
     */
    @Transactional
    public PlanPage page(CurrentStaff clinician, UUID episodeId) {
        EpisodeSummary episode = episode(clinician, episodeId, "PLAN_READ");
        Optional<GradedPlan> plan = plans.findByClinicIdAndEpisodeId(clinician.clinicId(), episodeId);
        if (plan.isPresent()) {
            audit.record(clinician, "PLAN_READ", "Plan", plan.get().getId(), episode.patientId(), "view=page");
        } else {
            audit.record(clinician, "PLAN_READ", "Episode", episodeId, episode.patientId(), "view=page,plan=none");
        }
        return pages.page(clinician, episode, plan.orElse(null));
    }

    /**
     * A first draft (or, when the plan has only issued versions, the next one) computed from the latest signed
     * screening with the given settings; refused with the reason when no plan can be made.
     */
    @Transactional
    public UUID generate(CurrentStaff clinician, UUID episodeId, PlanSettings settings) {
        EpisodeSummary episode = episode(clinician, episodeId, "PLAN_CREATE");
        GradedPlan plan = plans.findByClinicIdAndEpisodeId(clinician.clinicId(), episodeId).orElse(null);
        int number = 1;
        if (plan != null) {
            if (draft(plan).isPresent()) {
                throw new InvalidStateException("plan.error.draftExists");
            }
            number = versions.findFirstByClinicIdAndPlanIdOrderByNumberDesc(clinician.clinicId(), plan.getId())
                    .map(v -> v.getNumber() + 1).orElse(1);
        }
        Instant now = clock.instant();
        boolean created = plan == null;
        if (created) {
            plan = new GradedPlan(UUID.randomUUID(), clinician.clinicId(), episodeId, episode.patientId(), now,
                    clinician.staffId());
        }
        PlanVersion draft = new PlanVersion(UUID.randomUUID(), clinician.clinicId(), plan.getId(), number, now,
                clinician.staffId());
        drafting.compute(clinician, episode, draft, settings);
        if (created) {
            plans.saveAndFlush(plan);
        }
        versions.saveAndFlush(draft);
        audit.record(clinician, "PLAN_CREATE", "Plan", plan.getId(), plan.getPatientId(), "version=" + number);
        return plan.getId();
    }

    /** Starts the next version from the current issued one's settings and adjustments, recomputed. */
    @Transactional
    public void revise(CurrentStaff clinician, UUID planId) {
        GradedPlan plan = access.ownedByClinic(clinician, planId, "PLAN_CREATE");
        if (draft(plan).isPresent()) {
            throw new InvalidStateException("plan.error.draftExists");
        }
        PlanVersion issued = currentIssuedVersion(plan).orElseThrow(() -> new InvalidStateException("plan.error.noDraft"));
        PlanVersion next = issued.nextDraft(UUID.randomUUID(), clock.instant(), clinician.staffId());
        drafting.compute(clinician, episode(clinician, plan.getEpisodeId(), "PLAN_CREATE"), next, issued.settings());
        versions.saveAndFlush(next);
        audit.record(clinician, "PLAN_CREATE", "Plan", planId, plan.getPatientId(),
                "version=" + next.getNumber() + ",from=" + issued.getNumber());
    }

    /** New settings for the draft, recomputed from the latest sources; a stale form is a conflict. */
    @Transactional
    public void updateSettings(CurrentStaff clinician, UUID planId, long expectedLockVersion, PlanSettings settings) {
        GradedPlan plan = access.ownedByClinic(clinician, planId, "PLAN_UPDATE");
        PlanVersion draft = lockedDraft(clinician, plan, expectedLockVersion);
        drafting.compute(clinician, episode(clinician, plan.getEpisodeId(), "PLAN_UPDATE"), draft, settings);
        versions.saveAndFlush(draft);
        audit.record(clinician, "PLAN_UPDATE", "Plan", planId, plan.getPatientId(),
                "version=" + draft.getNumber() + ",settings");
    }

    /** Pins a step of the draft (the plan must pass through it) or removes it (re-planned around it). */
    @Transactional
    public void adjust(CurrentStaff clinician, UUID planId, long expectedLockVersion, int stepNumber,
                       AdjustmentKind kind) {
        GradedPlan plan = access.ownedByClinic(clinician, planId, "PLAN_UPDATE");
        PlanVersion draft = lockedDraft(clinician, plan, expectedLockVersion);
        PlannedStep step = draft.getSteps().stream().filter(s -> s.getNumber() == stepNumber).findFirst()
                .orElseThrow(() -> new InvalidStateException("plan.error.noSuchStep"));
        draft.adjust(new PlanAdjustment(kind, step.getClubId(), step.getGripMarkCm(), step.getCycleTimeS()));
        drafting.compute(clinician, episode(clinician, plan.getEpisodeId(), "PLAN_UPDATE"), draft, draft.settings());
        versions.saveAndFlush(draft);
        audit.record(clinician, "PLAN_UPDATE", "Plan", planId, plan.getPatientId(),
                "version=" + draft.getNumber() + "," + kind + "=step " + stepNumber);
    }

    /** Forgets every pin and removal of the draft and recomputes it. */
    @Transactional
    public void clearAdjustments(CurrentStaff clinician, UUID planId, long expectedLockVersion) {
        GradedPlan plan = access.ownedByClinic(clinician, planId, "PLAN_UPDATE");
        PlanVersion draft = lockedDraft(clinician, plan, expectedLockVersion);
        draft.clearAdjustments();
        drafting.compute(clinician, episode(clinician, plan.getEpisodeId(), "PLAN_UPDATE"), draft, draft.settings());
        versions.saveAndFlush(draft);
        audit.record(clinician, "PLAN_UPDATE", "Plan", planId, plan.getPatientId(),
                "version=" + draft.getNumber() + ",adjustments cleared");
    }

    // ---- Contract P: reads for the trainer workspace and other features ----

    /**
     * The current issued version of an episode's plan: for a clinician of the clinic, empty when there is none; for a
     * trainer only through an active share — anything else is a 404, audited.
     */
    @Transactional
    public Optional<IssuedPlanView> currentIssued(CurrentStaff staff, UUID episodeId) {
        Optional<GradedPlan> plan = plans.findByClinicIdAndEpisodeId(staff.clinicId(), episodeId);
        if (!staff.is(StaffRole.CLINICIAN)) {
            if (plan.isEmpty()) {
                throw access.denied(staff, "PLAN_READ", "Episode", episodeId, "no plan shared with the caller");
            }
            access.readable(staff, plan.get().getId(), "PLAN_READ");
        }
        return plan.flatMap(p -> currentIssuedVersion(p).map(v -> {
            audit.record(staff, "PLAN_READ", "Plan", p.getId(), p.getPatientId(), "version=" + v.getNumber());
            return views.issued(staff, p, v);
        }));
    }

    /** The current issued version of a plan the caller may read (trainer: through an active share); else 404. */
    @Transactional
    public IssuedPlanView issuedPlan(CurrentStaff staff, UUID planId) {
        GradedPlan plan = access.readable(staff, planId, "PLAN_READ");
        PlanVersion version = currentIssuedVersion(plan)
                .orElseThrow(() -> access.denied(staff, "PLAN_READ", "Plan", planId, "no issued version"));
        audit.record(staff, "PLAN_READ", "Plan", planId, plan.getPatientId(), "version=" + version.getNumber());
        return views.issued(staff, plan, version);
    }

    /** The plans actively shared with the trainer, with this week's step of each; one audited read per plan. */
    @Transactional
    public List<SharedPlanView> sharedWith(CurrentStaff trainer) {
        if (!trainer.is(StaffRole.TRAINER)) {
            return List.of();
        }
        LocalDate today = LocalDate.now(clock);
        List<SharedPlanView> result = new ArrayList<>();
        for (PlanShare share : shares.findByClinicIdAndTrainerIdAndUnsharedAtIsNullOrderBySharedAtDesc(
                trainer.clinicId(), trainer.staffId())) {
            Optional<GradedPlan> plan = plans.findByIdAndClinicId(share.getPlanId(), trainer.clinicId());
            if (plan.isEmpty() || !access.consentActive(trainer, share.getPatientId(), share.getConsentId())) {
                continue;
            }
            currentIssuedVersion(plan.get()).ifPresent(v -> {
                IssuedPlanView view = views.issued(trainer, plan.get(), v);
                audit.record(trainer, "PLAN_READ", "Plan", view.planId(), view.patientId(),
                        "version=" + v.getNumber() + ",view=list");
                PlanStepView thisWeek = view.stepFor(today).orElse(null);
                PlanStepView next = thisWeek == null ? null : view.after(thisWeek).orElse(null);
                result.add(new SharedPlanView(view.planId(), view.version(), view.episodeId(), view.patientId(),
                        view.patientLabel(), thisWeek, next, view.rescreenDue(today), view.steps().size(),
                        share.getSharedAt()));
            });
        }
        return result;
    }

    /** Whether the plan is actively shared with the trainer (no audit: a check, not a read of the plan). */
    @Transactional(readOnly = true)
    public boolean isSharedWith(CurrentStaff trainer, UUID planId) {
        return trainer.is(StaffRole.TRAINER) && plans.findByIdAndClinicId(planId, trainer.clinicId())
                .flatMap(plan -> access.activeShare(trainer, plan)).isPresent();
    }

    // ---- Handout ----

    /** The PDF handout of the plan's current issued version, for a clinician or a trainer it is shared with. */
    @Transactional
    public Handout handout(CurrentStaff staff, UUID planId, Locale locale) {
        GradedPlan plan = access.readable(staff, planId, "PLAN_EXPORT");
        PlanVersion version = currentIssuedVersion(plan)
                .orElseThrow(() -> access.denied(staff, "PLAN_EXPORT", "Plan", planId, "no issued version"));
        IssuedPlanView view = views.issued(staff, plan, version);
        Clinic clinic = staffAccounts.clinic(staff.clinicId()).orElseThrow(() -> new NotFoundException("clinic"));
        byte[] pdf = handouts.pdf(view, clinic, LocalDate.now(clock), locale);
        audit.record(staff, "PLAN_EXPORT", "Plan", planId, plan.getPatientId(),
                "version=" + version.getNumber() + ",format=pdf");
        return new Handout("plan-" + planId.toString().substring(0, 8) + "-v" + version.getNumber() + ".pdf", pdf);
    }

    // ---- Issuing and versions ----

    /** Signs the draft: from then on it is read-only (the database refuses changes); a change needs a new version. */
    @Transactional
    public void issue(CurrentStaff clinician, UUID planId, long expectedLockVersion) {
        GradedPlan plan = access.ownedByClinic(clinician, planId, "PLAN_ISSUE");
        PlanVersion draft = lockedDraft(clinician, plan, expectedLockVersion);
        if (draft.getSteps().isEmpty()) {
            throw new InvalidStateException("plan.issue.error.noSteps");
        }
        EpisodeSummary episode = episode(clinician, plan.getEpisodeId(), "PLAN_ISSUE");
        if (episode.onHold()) {
            throw new InvalidStateException("plan.issue.error.onHold");
        }
        if (!pages.restsOnLatestScreening(clinician, episode, draft)) {
            throw new InvalidStateException("plan.issue.error.staleScreening");
        }
        draft.issue(clinician.staffId(), clock.instant(), PlanFingerprint.of(draft));
        versions.saveAndFlush(draft);
        // Detail keys as the manager's reports read them: the episode and the date of the re-screen gate, if any.
        String rescreenDue = draft.getSteps().stream().filter(PlannedStep::isGateBefore).findFirst()
                .map(s -> ",rescreenDue=" + s.getStartsOn()).orElse("");
        audit.record(clinician, "PLAN_ISSUE", "Plan", planId, plan.getPatientId(),
                "episode=" + plan.getEpisodeId() + ",version=" + draft.getNumber() + rescreenDue);
    }

    /** Throws the draft away; a plan left without any version goes with it. */
    @Transactional
    public void discardDraft(CurrentStaff clinician, UUID planId, long expectedLockVersion) {
        GradedPlan plan = access.ownedByClinic(clinician, planId, "PLAN_DISCARD");
        PlanVersion draft = lockedDraft(clinician, plan, expectedLockVersion);
        versions.delete(draft);
        versions.flush();
        boolean empty = versions.findFirstByClinicIdAndPlanIdOrderByNumberDesc(clinician.clinicId(), planId).isEmpty();
        if (empty) {
            plans.delete(plan);
        }
        audit.record(clinician, "PLAN_DISCARD", "Plan", planId, plan.getPatientId(),
                "version=" + draft.getNumber() + (empty ? ",plan removed" : ""));
    }

    /** Each episode's plan at a glance, for the patient page; a plan shown is an audited read. */
    @Transactional
    public List<EpisodePlanSummary> summaries(CurrentStaff clinician, List<EpisodeSummary> episodes) {
        List<EpisodePlanSummary> result = new ArrayList<>();
        for (EpisodeSummary episode : episodes) {
            Optional<GradedPlan> plan = plans.findByClinicIdAndEpisodeId(clinician.clinicId(), episode.id());
            if (plan.isEmpty()) {
                result.add(new EpisodePlanSummary(episode, null, null, null, null, 0));
                continue;
            }
            GradedPlan p = plan.get();
            Optional<PlanVersion> issued = currentIssuedVersion(p);
            long active = sharing.sharesOf(clinician, p).stream().filter(ShareView::active).count();
            audit.record(clinician, "PLAN_READ", "Plan", p.getId(), p.getPatientId(), "view=summary");
            result.add(new EpisodePlanSummary(episode, p.getId(), issued.map(PlanVersion::getNumber).orElse(null),
                    issued.map(PlanVersion::getIssuedAt).orElse(null),
                    draft(p).map(PlanVersion::getNumber).orElse(null), active));
        }
        return result;
    }

    /** The episode of a plan of the caller's clinic (for a clinician's redirect); 404 otherwise, audited. */
    @Transactional(readOnly = true)
    public UUID episodeOf(CurrentStaff clinician, UUID planId) {
        return access.ownedByClinic(clinician, planId, "PLAN_READ").getEpisodeId();
    }

    // ---- Sharing and invitations ----

    @Transactional
    public UUID share(CurrentStaff clinician, UUID planId, UUID trainerId) {
        return sharing.share(clinician, planId, trainerId);
    }

    @Transactional
    public void unshare(CurrentStaff clinician, UUID planId, UUID shareId) {
        sharing.unshare(clinician, planId, shareId);
    }

    /** A one-time invitation link for a trainer without an account; the token is returned this once only. */
    @Transactional
    public NewInvitation invite(CurrentStaff clinician, UUID planId, String email, String name) {
        return sharing.invite(clinician, planId, email, name);
    }

    /** What the invitation page shows; 404 for an unknown link, a message for a used or expired one. */
    @Transactional(readOnly = true)
    public InvitationPage invitation(String token) {
        TrainerInvitation invitation = sharing.open(token);
        return new InvitationPage(staffAccounts.clinicName(invitation.getClinicId()), invitation.getEmail(),
                invitation.getInvitedName(), invitation.getExpiresAt());
    }

    /** Uses the invitation: a TRAINER account in the clinic with the plan shared; returns the new account's id. */
    @Transactional
    public UUID acceptInvitation(String token, String displayName, String password) {
        return sharing.accept(token, displayName, password);
    }

    // ---- helpers ----

    private Optional<PlanVersion> currentIssuedVersion(GradedPlan plan) {
        return versions.findFirstByClinicIdAndPlanIdAndStatusOrderByNumberDesc(plan.getClinicId(), plan.getId(),
                PlanStatus.ISSUED);
    }

    private Optional<PlanVersion> draft(GradedPlan plan) {
        return versions.findFirstByClinicIdAndPlanIdAndStatusOrderByNumberDesc(plan.getClinicId(), plan.getId(),
                PlanStatus.DRAFT);
    }

    /** The plan's draft, if the form that changes it was made from its current state; else a conflict (409). */
    private PlanVersion lockedDraft(CurrentStaff clinician, GradedPlan plan, long expectedLockVersion) {
        PlanVersion draft = draft(plan).orElseThrow(() -> new InvalidStateException("plan.error.noDraft"));
        if (draft.getLockVersion() != expectedLockVersion) {
            throw new ConflictException("plan draft");
        }
        return draft;
    }

    private EpisodeSummary episode(CurrentStaff clinician, UUID episodeId, String action) {
        if (!clinician.is(StaffRole.CLINICIAN)) {
            throw access.denied(clinician, action, "Episode", episodeId, "role may not plan");
        }
        return patients.findEpisode(clinician, episodeId).orElseThrow(() -> access.denied(clinician, action,
                "Episode", episodeId, "not in caller's clinic or missing"));
    }
}
