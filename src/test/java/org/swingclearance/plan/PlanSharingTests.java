package org.swingclearance.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.LocalDate;
import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.Patients;
import org.swingclearance.screening.Screenings;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * Sharing an issued plan with a trainer: only on the patient's recorded consent (matched by e-mail when the consent
 * has one, else by name), only once issued; unsharing and withdrawing the consent take effect at once; a trainer
 * reaches only plans shared with them (Contract P), every refusal a 404 with an audited denial.
 */
@IntegrationTest
class PlanSharingTests extends PostgresTestBase {

    @Autowired
    TestData data;
    @Autowired
    Clubs clubs;
    @Autowired
    Screenings screenings;
    @Autowired
    Plans plans;
    @Autowired
    PlanDrafting drafting;
    @Autowired
    Patients patients;
    @Autowired
    JdbcTemplate jdbc;

    UUID issuedPlan(PlanScenario s) {
        UUID planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        plans.issue(s.clinician(), planId, plans.page(s.clinician(), s.episodeId).draft().lockVersion());
        return planId;
    }

    @Test
    void sharingNeedsTheIssuedPlanAndTheConsentNamingTheTrainer() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        s.consentForTrainer(patients);
        assertThatThrownBy(() -> plans.share(s.clinician(), planId, s.trainer().staffId()))
                .isInstanceOfSatisfying(InvalidStateException.class,
                        e -> assertThat(e.messageKey()).isEqualTo("plan.share.error.notIssued"));
        plans.issue(s.clinician(), planId, plans.page(s.clinician(), s.episodeId).draft().lockVersion());

        CurrentStaff second = data.account(s.clinic.id(), StaffRole.TRAINER, "second-" + UUID.randomUUID() + "@test.local");
        assertThatThrownBy(() -> plans.share(s.clinician(), planId, second.staffId()))
                .isInstanceOfSatisfying(InvalidStateException.class, e -> {
                    assertThat(e.messageKey()).isEqualTo("plan.share.error.noConsent");
                    assertThat(e.args()).containsExactly(second.displayName());
                });
        assertThat(plans.isSharedWith(second, planId)).isFalse();

        plans.share(s.clinician(), planId, s.trainer().staffId());
        assertThat(plans.isSharedWith(s.trainer(), planId)).isTrue();
        assertThat(plans.sharedWith(s.trainer())).singleElement()
                .satisfies(p -> assertThat(p.planId()).isEqualTo(planId));
        assertThat(plans.sharedWith(second)).isEmpty();
    }

    @Test
    void aConsentWithoutEmailMatchesByNameAndOneWithAnotherEmailDoesNot() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = issuedPlan(s);
        // Same name, different e-mail: the e-mail decides, so this consent does not name the clinic's trainer.
        patients.recordConsent(s.clinician(), s.patientId, s.trainer().displayName(), "someone.else@test.local",
                LocalDate.now());
        assertThatThrownBy(() -> plans.share(s.clinician(), planId, s.trainer().staffId()))
                .isInstanceOf(InvalidStateException.class);
        // No e-mail recorded: the name decides, compared without case and extra spaces.
        patients.recordConsent(s.clinician(), s.patientId, "  " + s.trainer().displayName().toUpperCase() + " ",
                null, LocalDate.now());
        plans.share(s.clinician(), planId, s.trainer().staffId());
        assertThat(plans.isSharedWith(s.trainer(), planId)).isTrue();
    }

    @Test
    void unsharingAndWithdrawingConsentTakeEffectAtOnce() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = issuedPlan(s);
        UUID consent = s.consentForTrainer(patients);
        UUID share = plans.share(s.clinician(), planId, s.trainer().staffId());
        assertThat(plans.issuedPlan(s.trainer(), planId).planId()).isEqualTo(planId);

        plans.unshare(s.clinician(), planId, share);
        assertThat(plans.isSharedWith(s.trainer(), planId)).isFalse();
        assertThatThrownBy(() -> plans.issuedPlan(s.trainer(), planId)).isInstanceOf(NotFoundException.class);
        assertThat(deniedReads(s.trainer(), planId)).isEqualTo(1);
        // An ended share is history: the database refuses to reopen or delete it.
        assertThatThrownBy(() -> jdbc.update("update plan_share set unshared_at = null, unshared_by = null where id = ?",
                share)).isInstanceOf(DataAccessException.class);
        assertThatThrownBy(() -> jdbc.update("delete from plan_share where id = ?", share))
                .isInstanceOf(DataAccessException.class);

        plans.share(s.clinician(), planId, s.trainer().staffId());
        assertThat(plans.isSharedWith(s.trainer(), planId)).isTrue();
        patients.withdrawConsent(s.clinician(), s.patientId, consent, LocalDate.now());
        assertThat(plans.isSharedWith(s.trainer(), planId)).isFalse();
        // the share itself is ended and the trail shows the unshare (the manager's share report reads it)
        assertThat(jdbc.queryForObject("select count(*) from plan_share where plan_id = ? and unshared_at is null",
                Integer.class, planId)).isZero();
        assertThat(jdbc.queryForList("select detail from audit_event where object_id = ? and action = 'PLAN_UNSHARE'"
                + " order by seq", String.class, planId.toString()))
                .hasSize(2) // the clinician's unshare above, then the one the withdrawal made
                .last().asString().contains("consent withdrawn");
        assertThat(plans.sharedWith(s.trainer())).isEmpty();
        assertThatThrownBy(() -> plans.currentIssued(s.trainer(), s.episodeId)).isInstanceOf(NotFoundException.class);
    }

    @Test
    void aTrainerOfAnotherClinicOrWithoutShareNeverReachesThePlan() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = issuedPlan(s);
        s.consentForTrainer(patients);
        plans.share(s.clinician(), planId, s.trainer().staffId());
        PlanScenario other = PlanScenario.create(data, clubs, screenings);
        assertThatThrownBy(() -> plans.issuedPlan(other.trainer(), planId)).isInstanceOf(NotFoundException.class);
        assertThatThrownBy(() -> plans.share(other.clinician(), planId, other.trainer().staffId()))
                .isInstanceOf(NotFoundException.class);
        assertThatThrownBy(() -> plans.share(s.clinician(), planId, other.trainer().staffId()))
                .isInstanceOf(NotFoundException.class);
        assertThat(plans.isSharedWith(other.trainer(), planId)).isFalse();
        assertThat(deniedReads(other.trainer(), planId)).isEqualTo(1);
    }

    @Test
    void contractPGivesTheTrainerThisWeeksStepAndNothingBeyondThePlan() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = issuedPlan(s);
        s.consentForTrainer(patients);
        plans.share(s.clinician(), planId, s.trainer().staffId());
        IssuedPlanView view = plans.currentIssued(s.trainer(), s.episodeId).orElseThrow();
        assertThat(view.planId()).isEqualTo(planId);
        // The plan started 8 days ago with a step every 7 days: this week is step 2.
        assertThat(view.stepFor(LocalDate.now()).orElseThrow().number()).isEqualTo(2);
        SharedPlanView shared = plans.sharedWith(s.trainer()).get(0);
        assertThat(shared.thisWeek().number()).isEqualTo(2);
        assertThat(shared.next().number()).isEqualTo(3);
        assertThat(shared.patientLabel()).isEqualTo("Test Patient (" + patientCode(s) + ")");
    }

    @Test
    void everyReadAndChangeOfAPlanIsAuditedWithTheDetailsTheReportsRead() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        PlanVersionView draft = plans.page(s.clinician(), s.episodeId).draft();
        plans.updateSettings(s.clinician(), planId, draft.lockVersion(), draft.settings());
        plans.issue(s.clinician(), planId, plans.page(s.clinician(), s.episodeId).draft().lockVersion());
        s.consentForTrainer(patients);
        UUID share = plans.share(s.clinician(), planId, s.trainer().staffId());
        plans.currentIssued(s.trainer(), s.episodeId);
        plans.handout(s.trainer(), planId, java.util.Locale.ENGLISH);
        plans.unshare(s.clinician(), planId, share);
        String email = "invited-" + UUID.randomUUID().toString().substring(0, 8) + "@test.local";
        patients.recordConsent(s.clinician(), s.patientId, "Ivy Invited", email, LocalDate.now());
        plans.invite(s.clinician(), planId, email, "Ivy Invited");

        List<String> actions = jdbc.queryForList("select distinct action from audit_event where object_id = ?"
                + " and outcome = 'SUCCESS' and patient_id = ?", String.class, planId.toString(), s.patientId);
        assertThat(actions).contains("PLAN_CREATE", "PLAN_UPDATE", "PLAN_ISSUE", "PLAN_READ", "PLAN_SHARE",
                "PLAN_EXPORT", "PLAN_UNSHARE");
        assertThat(jdbc.queryForObject("select count(*) from audit_event where action = 'INVITATION_CREATE'"
                + " and patient_id = ?", Integer.class, s.patientId)).isEqualTo(1);
        assertThat(jdbc.queryForObject("select detail from audit_event where action = 'PLAN_ISSUE' and object_id = ?",
                String.class, planId.toString())).startsWith("episode=" + s.episodeId + ",version=1");
        assertThat(jdbc.queryForList("select detail from audit_event where action in ('PLAN_SHARE', 'PLAN_UNSHARE')"
                + " and object_id = ?", String.class, planId.toString()))
                .hasSize(2).allSatisfy(d -> assertThat(d).contains("trainer=" + s.trainer().staffId()));
    }

    int deniedReads(CurrentStaff who, UUID planId) {
        return jdbc.queryForObject("select count(*) from audit_event where actor_id = ? and object_id = ?"
                + " and outcome = 'DENIED'", Integer.class, who.staffId(), planId.toString());
    }

    String patientCode(PlanScenario s) {
        return patients.find(s.clinician(), s.patientId).orElseThrow().code();
    }
}
