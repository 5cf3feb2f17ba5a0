package org.swingclearance.plan;

import java.util.Optional;
import java.util.UUID;
import org.springframework.stereotype.Component;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.Patients;
import org.swingclearance.web.NotFoundException;

/**
 * Who may reach which plan: a clinician any plan of their clinic; a trainer only a plan shared with them by an
 * active share whose consent is still active; nobody a plan of another clinic. Every refusal is a 404, audited.
 * Runs inside the calling service's transaction.
 */
@Component
class PlanAccess {

    private final GradedPlanRepository plans;
    private final PlanShareRepository shares;
    private final Patients patients;
    private final AuditLog audit;

    PlanAccess(GradedPlanRepository plans, PlanShareRepository shares, Patients patients, AuditLog audit) {
        this.plans = plans;
        this.shares = shares;
        this.patients = patients;
        this.audit = audit;
    }

    /** The plan for a clinician of its clinic, or a trainer it is actively shared with; else 404, audited. */
    GradedPlan readable(CurrentStaff staff, UUID planId, String action) {
        Optional<GradedPlan> plan = plans.findByIdAndClinicId(planId, staff.clinicId());
        if (plan.isPresent() && (staff.is(StaffRole.CLINICIAN)
                || staff.is(StaffRole.TRAINER) && activeShare(staff, plan.get()).isPresent())) {
            return plan.get();
        }
        throw denied(staff, action, "Plan", planId,
                plan.isPresent() ? "not shared with the caller" : "not in caller's clinic or missing");
    }

    /** The plan for a clinician of its clinic only (changes, sharing, invitations); else 404, audited. */
    GradedPlan ownedByClinic(CurrentStaff clinician, UUID planId, String action) {
        if (!clinician.is(StaffRole.CLINICIAN)) {
            throw denied(clinician, action, "Plan", planId, "role may not change plans");
        }
        return plans.findByIdAndClinicId(planId, clinician.clinicId())
                .orElseThrow(() -> denied(clinician, action, "Plan", planId, "not in caller's clinic or missing"));
    }

    /** The trainer's active share of the plan, counted only while the consent it rests on is still active. */
    Optional<PlanShare> activeShare(CurrentStaff trainer, GradedPlan plan) {
        return shares.findByClinicIdAndPlanIdAndTrainerIdAndUnsharedAtIsNull(trainer.clinicId(), plan.getId(),
                        trainer.staffId())
                .filter(share -> consentActive(trainer, plan.getPatientId(), share.getConsentId()));
    }

    boolean consentActive(CurrentStaff staff, UUID patientId, UUID consentId) {
        return patients.activeConsents(staff, patientId).stream().anyMatch(c -> c.id().equals(consentId));
    }

    NotFoundException denied(CurrentStaff staff, String action, String type, Object id, String why) {
        audit.recordDenied(staff, action, type, id, why);
        return new NotFoundException(type);
    }
}
