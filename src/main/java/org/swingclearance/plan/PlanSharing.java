package org.swingclearance.plan;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.UUID;
import org.springframework.context.event.EventListener;
import org.springframework.stereotype.Component;
import org.swingclearance.audit.AuditDetail;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.audit.AuditOutcome;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.PasswordPolicy;
import org.swingclearance.identity.StaffAccount;
import org.swingclearance.identity.StaffAccounts;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.identity.StaffView;
import org.swingclearance.identity.UnitSystem;
import org.swingclearance.patient.ConsentView;
import org.swingclearance.patient.ConsentWithdrawn;
import org.swingclearance.patient.Patients;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * Sharing an issued plan with a trainer on the patient's recorded consent, ending a share, and one-time invitations
 * for a trainer without an account. Runs inside the {@link Plans} service's transactions.
 */
@Component
class PlanSharing {

    /** How long an invitation link stays usable. */
    static final Duration INVITATION_VALIDITY = Duration.ofDays(7);

    private final PlanShareRepository shares;
    private final TrainerInvitationRepository invitations;
    private final PlanVersionRepository versions;
    private final PlanAccess access;
    private final Patients patients;
    private final StaffAccounts staffAccounts;
    private final InvitedTrainerAccounts newAccounts;
    private final AuditLog audit;
    private final Clock clock;

    PlanSharing(PlanShareRepository shares, TrainerInvitationRepository invitations, PlanVersionRepository versions,
                PlanAccess access, Patients patients, StaffAccounts staffAccounts, InvitedTrainerAccounts newAccounts,
                AuditLog audit, Clock clock) {
        this.shares = shares;
        this.invitations = invitations;
        this.versions = versions;
        this.access = access;
        this.patients = patients;
        this.staffAccounts = staffAccounts;
        this.newAccounts = newAccounts;
        this.audit = audit;
        this.clock = clock;
    }

    UUID share(CurrentStaff clinician, UUID planId, UUID trainerId) {
        GradedPlan plan = access.ownedByClinic(clinician, planId, "PLAN_SHARE");
        requireIssued(clinician, plan);
        StaffView trainer = staffAccounts.activeOfRole(clinician, StaffRole.TRAINER).stream()
                .filter(t -> t.id().equals(trainerId)).findFirst()
                .orElseThrow(() -> access.denied(clinician, "PLAN_SHARE", "StaffAccount", trainerId,
                        "not an active trainer of the caller's clinic"));
        ConsentView consent = ConsentMatch.find(patients.activeConsents(clinician, plan.getPatientId()),
                        trainer.email(), trainer.displayName())
                .orElseThrow(() -> new InvalidStateException("plan.share.error.noConsent", trainer.displayName()));
        Instant now = clock.instant();
        shares.findByClinicIdAndPlanIdAndTrainerIdAndUnsharedAtIsNull(clinician.clinicId(), planId, trainerId)
                .ifPresent(existing -> {
                    if (access.consentActive(clinician, plan.getPatientId(), existing.getConsentId())) {
                        throw new InvalidStateException("plan.share.error.alreadyShared", trainer.displayName());
                    }
                    // The consent it rested on was withdrawn: close it before the share on the new consent.
                    existing.end(clinician.staffId(), now);
                    shares.saveAndFlush(existing);
                    audit.record(clinician, "PLAN_UNSHARE", "Plan", planId, plan.getPatientId(),
                            "share=" + existing.getId() + ",trainer=" + trainerId + ",reason=consent withdrawn");
                });
        PlanShare share = new PlanShare(UUID.randomUUID(), clinician.clinicId(), planId, plan.getPatientId(),
                trainerId, consent.id(), now, clinician.staffId());
        shares.save(share);
        audit.record(clinician, "PLAN_SHARE", "Plan", planId, plan.getPatientId(),
                "share=" + share.getId() + ",trainer=" + trainerId + ",consent=" + consent.id());
        return share.getId();
    }

    void unshare(CurrentStaff clinician, UUID planId, UUID shareId) {
        GradedPlan plan = access.ownedByClinic(clinician, planId, "PLAN_UNSHARE");
        PlanShare share = shares.findByIdAndClinicId(shareId, clinician.clinicId())
                .filter(s -> s.getPlanId().equals(planId))
                .orElseThrow(() -> access.denied(clinician, "PLAN_UNSHARE", "PlanShare", shareId,
                        "not a share of this plan"));
        if (!share.isActive()) {
            throw new InvalidStateException("plan.unshare.error.ended");
        }
        share.end(clinician.staffId(), clock.instant());
        shares.saveAndFlush(share);
        audit.record(clinician, "PLAN_UNSHARE", "Plan", planId, plan.getPatientId(),
                "share=" + shareId + ",trainer=" + share.getTrainerId());
    }

    /**
     * A withdrawn consent ends, in the same transaction, every active share that rested on it: access already ends
     * with the consent, and the trail then shows the unshare (the manager's share reports read PLAN_UNSHARE).
     */
    @EventListener
    void endSharesOf(ConsentWithdrawn withdrawn) {
        CurrentStaff by = withdrawn.by();
        for (PlanShare share : shares.findByClinicIdAndConsentIdAndUnsharedAtIsNull(by.clinicId(), withdrawn.consentId())) {
            share.end(by.staffId(), clock.instant());
            shares.saveAndFlush(share);
            audit.record(by, "PLAN_UNSHARE", "Plan", share.getPlanId(), share.getPatientId(),
                    AuditDetail.of("share", share.getId(), "trainer", share.getTrainerId(), "reason", "consent withdrawn"));
        }
    }

    List<ShareView> sharesOf(CurrentStaff clinician, GradedPlan plan) {
        List<UUID> activeConsents = patients.activeConsents(clinician, plan.getPatientId()).stream()
                .map(ConsentView::id).toList();
        return shares.findByClinicIdAndPlanIdOrderBySharedAtDesc(clinician.clinicId(), plan.getId()).stream()
                .map(s -> {
                    StaffView trainer = staffAccounts.find(clinician, s.getTrainerId()).orElse(null);
                    return new ShareView(s.getId(), s.getTrainerId(), trainer == null ? "" : trainer.displayName(),
                            trainer == null ? "" : trainer.email(), s.getSharedAt(), s.getUnsharedAt(),
                            activeConsents.contains(s.getConsentId()));
                }).toList();
    }

    List<TrainerOption> trainerOptions(CurrentStaff clinician, GradedPlan plan, List<ShareView> current) {
        List<ConsentView> consents = patients.activeConsents(clinician, plan.getPatientId());
        return staffAccounts.activeOfRole(clinician, StaffRole.TRAINER).stream()
                .map(t -> new TrainerOption(t.id(), t.displayName(), t.email(),
                        ConsentMatch.find(consents, t.email(), t.displayName()).isPresent(),
                        current.stream().anyMatch(s -> s.active() && s.trainerId().equals(t.id()))))
                .toList();
    }

    List<InvitationView> invitationsOf(CurrentStaff clinician, GradedPlan plan) {
        Instant now = clock.instant();
        return invitations.findByClinicIdAndPlanIdOrderByCreatedAtDesc(clinician.clinicId(), plan.getId()).stream()
                .map(i -> InvitationView.of(i, now)).toList();
    }

    NewInvitation invite(CurrentStaff clinician, UUID planId, String email, String name) {
        GradedPlan plan = access.ownedByClinic(clinician, planId, "INVITATION_CREATE");
        requireIssued(clinician, plan);
        String address = email.trim().toLowerCase(Locale.ROOT);
        if (newAccounts.emailTaken(address)) {
            throw new InvalidStateException("plan.invite.error.accountExists");
        }
        ConsentView consent = ConsentMatch.find(patients.activeConsents(clinician, plan.getPatientId()), address,
                        name).orElseThrow(() -> new InvalidStateException("plan.invite.error.noConsent", name.trim()));
        String token = InvitationTokens.newToken();
        Instant now = clock.instant();
        TrainerInvitation invitation = new TrainerInvitation(UUID.randomUUID(), clinician.clinicId(), planId,
                plan.getPatientId(), consent.id(), address, name.trim(), InvitationTokens.sha256(token), now,
                clinician.staffId(), now.plus(INVITATION_VALIDITY));
        invitations.save(invitation);
        audit.record(clinician, "INVITATION_CREATE", "TrainerInvitation", invitation.getId(), plan.getPatientId(),
                "plan=" + planId + ",consent=" + consent.id());
        return new NewInvitation(token, address, invitation.getExpiresAt());
    }

    /** The open invitation behind a link; an unknown token is a 404, a used or expired one is explained. */
    TrainerInvitation open(String token) {
        TrainerInvitation invitation = find(token, false);
        requireOpen(invitation);
        return invitation;
    }

    /**
     * Uses the invitation: opens a TRAINER account in the invitation's clinic with the share active. Refused (and
     * nothing created) when the link is used or expired, the e-mail has an account meanwhile, the password breaks the
     * policy, the consent was withdrawn, or — for a consent recorded by name only — the name differs from it.
     */
    UUID accept(String token, String displayName, String password) {
        TrainerInvitation invitation = find(token, true);
        try {
            requireOpen(invitation);
        } catch (InvalidStateException refused) {
            audit.recordAnonymous(invitation.getClinicId(), invitation.getEmail(), "INVITATION_ACCEPT",
                    AuditOutcome.DENIED, null, "invitation=" + invitation.getId() + "," + refused.messageKey());
            throw refused;
        }
        if (newAccounts.emailTaken(invitation.getEmail())) {
            throw new InvalidStateException("invitation.error.accountExists");
        }
        PasswordPolicy.violation(password, invitation.getEmail()).ifPresent(key -> {
            throw new InvalidStateException(key);
        });
        Instant now = clock.instant();
        StaffAccount account = newAccounts.open(invitation.getClinicId(), invitation.getEmail(), displayName,
                password, now);
        CurrentStaff trainer = new CurrentStaff(account.getId(), account.getClinicId(), StaffRole.TRAINER,
                account.getEmail(), account.getDisplayName(), UnitSystem.METRIC);
        ConsentView consent = patients.activeConsents(trainer, invitation.getPatientId()).stream()
                .filter(c -> c.id().equals(invitation.getConsentId())).findFirst()
                .orElseThrow(() -> new InvalidStateException("invitation.error.consentWithdrawn"));
        if ((consent.trainerEmail() == null || consent.trainerEmail().isBlank())
                && !ConsentMatch.sameName(consent.trainerName(), displayName)) {
            throw new InvalidStateException("invitation.error.nameDiffers", consent.trainerName());
        }
        invitation.markUsed(account.getId(), now);
        invitations.saveAndFlush(invitation);
        PlanShare share = new PlanShare(UUID.randomUUID(), invitation.getClinicId(), invitation.getPlanId(),
                invitation.getPatientId(), account.getId(), consent.id(), now, invitation.getCreatedBy());
        shares.save(share);
        audit.record(trainer, "INVITATION_ACCEPT", "TrainerInvitation", invitation.getId(), invitation.getPatientId(),
                "account=" + account.getId());
        audit.record(trainer, "PLAN_SHARE", "Plan", invitation.getPlanId(), invitation.getPatientId(),
                "share=" + share.getId() + ",trainer=" + account.getId() + ",invitation=" + invitation.getId()
                        + ",invitedBy=" + invitation.getCreatedBy());
        return account.getId();
    }

    private TrainerInvitation find(String token, boolean lock) {
        String hash = InvitationTokens.sha256(token == null ? "" : token);
        return (lock ? invitations.findLockedByTokenSha256(hash) : invitations.findByTokenSha256(hash))
                .orElseThrow(() -> new NotFoundException("invitation"));
    }

    private void requireOpen(TrainerInvitation invitation) {
        if (invitation.getUsedAt() != null) {
            throw new InvalidStateException("invitation.error.used");
        }
        if (!invitation.isOpenAt(clock.instant())) {
            throw new InvalidStateException("invitation.error.expired");
        }
    }

    private void requireIssued(CurrentStaff clinician, GradedPlan plan) {
        if (versions.findFirstByClinicIdAndPlanIdAndStatusOrderByNumberDesc(clinician.clinicId(), plan.getId(),
                PlanStatus.ISSUED).isEmpty()) {
            throw new InvalidStateException("plan.share.error.notIssued");
        }
    }
}
