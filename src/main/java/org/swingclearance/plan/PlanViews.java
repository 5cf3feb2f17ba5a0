package org.swingclearance.plan;

import java.util.List;
import java.util.UUID;
import org.springframework.stereotype.Component;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffAccounts;
import org.swingclearance.identity.StaffView;
import org.swingclearance.patient.PatientSummary;
import org.swingclearance.patient.Patients;

/** Turns stored plan versions into the views pages, the handout and the trainer workspace read. */
@Component
class PlanViews {

    private final Patients patients;
    private final StaffAccounts staffAccounts;

    PlanViews(Patients patients, StaffAccounts staffAccounts) {
        this.patients = patients;
        this.staffAccounts = staffAccounts;
    }

    IssuedPlanView issued(CurrentStaff staff, GradedPlan plan, PlanVersion v) {
        List<PlanStepView> steps = v.getSteps().stream().map(PlanStepView::of).toList();
        Integer gate = v.getSteps().stream().filter(PlannedStep::isGateBefore).map(PlannedStep::getNumber)
                .findFirst().orElse(null);
        return new IssuedPlanView(plan.getId(), v.getNumber(), plan.getEpisodeId(), plan.getPatientId(),
                patientLabel(staff, plan.getPatientId()), steps, gate, v.getPatternName(), v.getBand(),
                v.getStepUnit(), v.getStepLength(), v.getSessionsPerWeek(), v.getStartsOn(), v.getPainDuringLimit(),
                v.getStepLimit(), v.getIssuedAt(), staffName(staff, v.getIssuedBy()), v.getContentSha256());
    }

    PlanVersionView version(CurrentStaff staff, PlanVersion v) {
        return new PlanVersionView(v.getId(), v.getPlanId(), v.getNumber(), v.getStatus(), v.getLockVersion(),
                v.getSourceScreeningId(), v.getSourceScreeningVersion(), v.getRulesVersion(), v.getEngineVersion(),
                v.getBand(), v.getPatternName(), v.settings(), v.getAdjustments(),
                v.getSteps().stream().map(StepDetail::of).toList(), v.getStepLimit(), v.getPainDuringLimit(),
                v.getOutcomeKey(), MessageArgs.split(v.getOutcomeArgs()), v.getCreatedAt(), v.getIssuedAt(),
                v.getIssuedBy() == null ? null : staffName(staff, v.getIssuedBy()), v.getContentSha256());
    }

    /** The patient's name and code (or the code alone): the one identifying detail a trainer sees. */
    String patientLabel(CurrentStaff staff, UUID patientId) {
        return patients.find(staff, patientId).map(PatientSummary::label).orElse("");
    }

    String staffName(CurrentStaff staff, UUID staffId) {
        return staffAccounts.find(staff, staffId).map(StaffView::displayName).orElse("");
    }
}
