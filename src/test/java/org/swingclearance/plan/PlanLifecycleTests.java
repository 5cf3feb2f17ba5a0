package org.swingclearance.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.UUID;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.patient.Patients;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.patient.RedFlagContext;
import org.swingclearance.screening.Screenings;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.InvalidStateException;

/**
 * Generating, adjusting, issuing and versioning a plan on real PostgreSQL: an issued version is read-only in the
 * database itself (plain SQL UPDATE and DELETE are refused by triggers), changes make a new version, a stale form is
 * a conflict, and an episode on hold gets no plan.
 */
@IntegrationTest
class PlanLifecycleTests extends PostgresTestBase {

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

    @Test
    void generatingMakesADraftFromTheLatestSignedScreeningWithStepsWithinTheBand() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        PlanPage page = plans.page(s.clinician(), s.episodeId);
        assertThat(page.planId()).isEqualTo(planId);
        PlanVersionView draft = page.draft();
        assertThat(draft.number()).isEqualTo(1);
        assertThat(draft.steps()).isNotEmpty();
        assertThat(draft.steps()).allSatisfy(d -> assertThat(d.step().demandRatio()).isLessThanOrEqualTo(1.0));
        assertThat(draft.sourceScreeningId()).isNotNull();
        assertThat(draft.engineVersion()).contains("swing-mechanics");
        assertThat(draft.outcomeArgs()).singleElement().asString().startsWith("The plan reaches");
        assertThat(audits(planId, "PLAN_CREATE")).isEqualTo(1);
    }

    @Test
    void anIssuedVersionIsReadOnlyInTheDatabaseAndAChangeMakesANewVersion() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        PlanVersionView draft = plans.page(s.clinician(), s.episodeId).draft();
        plans.issue(s.clinician(), planId, draft.lockVersion());

        UUID versionId = draft.id();
        // Plain SQL, as a person with database access would try it: every change to the issued version is refused.
        assertThatThrownBy(() -> jdbc.update("update plan_version set step_length = 9 where id = ?", versionId))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("read-only");
        assertThatThrownBy(() -> jdbc.update("delete from plan_version where id = ?", versionId))
                .isInstanceOf(DataAccessException.class);
        assertThatThrownBy(() -> jdbc.update("update plan_step set reps = 99 where plan_version_id = ?", versionId))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("issued plan version");
        assertThatThrownBy(() -> jdbc.update("delete from plan_step where plan_version_id = ?", versionId))
                .isInstanceOf(DataAccessException.class);
        assertThatThrownBy(() -> jdbc.update("delete from plan_band_dose where plan_version_id = ?", versionId))
                .isInstanceOf(DataAccessException.class);
        assertThatThrownBy(() -> jdbc.update("truncate plan_step cascade"))
                .isInstanceOf(DataAccessException.class);
        assertThat(jdbc.queryForObject("select status from plan_version where id = ?", String.class, versionId))
                .isEqualTo("ISSUED");

        IssuedPlanView issued = plans.currentIssued(s.clinician(), s.episodeId).orElseThrow();
        assertThat(issued.version()).isEqualTo(1);
        assertThat(issued.fingerprint()).hasSize(64);

        plans.revise(s.clinician(), planId);
        PlanPage page = plans.page(s.clinician(), s.episodeId);
        assertThat(page.draft().number()).isEqualTo(2);
        assertThat(page.issued().number()).isEqualTo(1);
        PlanSettings longer = withStepLength(page.draft().settings(), 7);
        plans.updateSettings(s.clinician(), planId, page.draft().lockVersion(), longer);
        plans.issue(s.clinician(), planId, plans.page(s.clinician(), s.episodeId).draft().lockVersion());
        IssuedPlanView second = plans.currentIssued(s.clinician(), s.episodeId).orElseThrow();
        assertThat(second.version()).isEqualTo(2);
        assertThat(second.stepLength()).isEqualTo(7);
        // The first version is unchanged.
        assertThat(jdbc.queryForObject("select step_length from plan_version where id = ?", Integer.class, versionId))
                .isEqualTo(3);
        assertThat(audits(planId, "PLAN_ISSUE")).isEqualTo(2);
    }

    @Test
    void aStaleDraftFormIsAConflictAndSavesNothing() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        PlanVersionView draft = plans.page(s.clinician(), s.episodeId).draft();
        plans.updateSettings(s.clinician(), planId, draft.lockVersion(), withStepLength(draft.settings(), 5));
        assertThatThrownBy(() -> plans.updateSettings(s.clinician(), planId, draft.lockVersion(),
                withStepLength(draft.settings(), 9))).isInstanceOf(ConflictException.class);
        assertThatThrownBy(() -> plans.issue(s.clinician(), planId, draft.lockVersion()))
                .isInstanceOf(ConflictException.class);
        assertThat(plans.page(s.clinician(), s.episodeId).draft().settings().stepLength()).isEqualTo(5);
    }

    @Test
    void pinningAndRemovingAStepReplansAroundIt() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        PlanVersionView draft = plans.page(s.clinician(), s.episodeId).draft();
        StepDetail removed = draft.steps().get(draft.steps().size() / 2);
        plans.adjust(s.clinician(), planId, draft.lockVersion(), removed.step().number(), AdjustmentKind.REMOVE);
        PlanVersionView after = plans.page(s.clinician(), s.episodeId).draft();
        assertThat(after.removedCount()).isEqualTo(1);
        assertThat(after.steps()).noneMatch(d -> sameState(d.step(), removed.step()));

        StepDetail pinned = after.steps().get(1);
        plans.adjust(s.clinician(), planId, after.lockVersion(), pinned.step().number(), AdjustmentKind.PIN);
        PlanVersionView pinnedDraft = plans.page(s.clinician(), s.episodeId).draft();
        assertThat(pinnedDraft.steps()).anyMatch(d -> d.pinned() && sameState(d.step(), pinned.step()));

        plans.clearAdjustments(s.clinician(), planId, pinnedDraft.lockVersion());
        assertThat(plans.page(s.clinician(), s.episodeId).draft().adjustments()).isEmpty();
    }

    @Test
    void aTargetOffTheGridIsRefusedWithItsFieldAndNothingIsSaved() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        PlanSettings defaults = s.settings(drafting);
        PlanSettings offGrid = new PlanSettings(defaults.patternId(), new PlanTarget(s.clubs.get(0), 11.0, 2.0),
                false, defaults.stepUnit(), 3, 3, defaults.startsOn(), defaults.doses());
        assertThatThrownBy(() -> plans.generate(s.clinician(), s.episodeId, offGrid))
                .isInstanceOfSatisfying(PlanSettingsRejected.class, e -> {
                    assertThat(e.field()).isEqualTo("targetGripMarkCm");
                    assertThat(e.messageKey()).isEqualTo("plan.settings.error.gripGrid");
                    assertThat(e.args()).containsExactly("11.0", "10.0", "12.5");
                });
        assertThat(plans.page(s.clinician(), s.episodeId).hasPlan()).isFalse();
    }

    @Test
    void aTargetOutsideTheEnvelopeIsExplainedWithWhatTheEnvelopePermits() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        PlanSettings defaults = s.settings(drafting);
        // The heaviest club held at the knob at 50 swings a minute: far beyond 40 % of the patient's 90 N·m.
        PlanSettings beyond = new PlanSettings(defaults.patternId(), new PlanTarget(s.clubs.get(2), 0.0, 1.2),
                false, defaults.stepUnit(), 3, 3, defaults.startsOn(), defaults.doses());
        UUID planId = plans.generate(s.clinician(), s.episodeId, beyond);
        PlanVersionView draft = plans.page(s.clinician(), s.episodeId).draft();
        assertThat(draft.outcomeKey()).isIn("engine.plan.shortfall.OUTSIDE_ENVELOPE",
                "engine.plan.shortfall.NEEDS_RESCREEN");
        assertThat(draft.outcomeArgs().get(0)).startsWith("Cannot reach the target")
                .contains("The envelope for Club 4.6 kg in this pattern");
        StepDetail last = draft.steps().get(draft.steps().size() - 1);
        assertThat(last.step().clubId().equals(s.clubs.get(2)) && last.step().gripMarkCm() == 0.0
                && last.step().cycleTimeS() == 1.2).as("never clipped to the target").isFalse();
        assertThat(jdbc.queryForObject("select envelope_snapshot_id is not null from plan_version where plan_id = ?",
                Boolean.class, planId)).isTrue();
    }

    @Test
    void anEpisodeOnHoldGetsNoPlanAndThePageSaysWhy() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        patients.recordRedFlags(s.clinician(), s.episodeId, RedFlagContext.RECHECK,
                java.util.EnumSet.of(RedFlag.values()[0]));
        assertThat(plans.page(s.clinician(), s.episodeId).blockedKey()).isEqualTo("plan.blocked.onHold");
        assertThatThrownBy(() -> plans.generate(s.clinician(), s.episodeId, s.settings(drafting)))
                .isInstanceOfSatisfying(InvalidStateException.class,
                        e -> assertThat(e.messageKey()).isEqualTo("plan.blocked.onHold"));
        assertThat(plans.page(s.clinician(), s.episodeId).hasPlan()).isFalse();
    }

    @Test
    void anotherClinicsEpisodeIsNotFound() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        PlanScenario other = PlanScenario.create(data, clubs, screenings);
        assertThatThrownBy(() -> plans.page(other.clinician(), s.episodeId))
                .isInstanceOf(org.swingclearance.web.NotFoundException.class);
        assertThat(jdbc.queryForObject("select count(*) from audit_event where actor_id = ? and outcome = 'DENIED'"
                + " and object_id = ?", Integer.class, other.clinician().staffId(), s.episodeId.toString())).isEqualTo(1);
    }

    static PlanSettings withStepLength(PlanSettings s, int length) {
        return new PlanSettings(s.patternId(), s.target(), s.continueProvisionally(), s.stepUnit(), length,
                s.sessionsPerWeek(), s.startsOn(), s.doses());
    }

    static boolean sameState(PlanStepView a, PlanStepView b) {
        return a.clubId().equals(b.clubId()) && a.gripMarkCm() == b.gripMarkCm() && a.cycleTimeS() == b.cycleTimeS();
    }

    int audits(UUID planId, String action) {
        return jdbc.queryForObject("select count(*) from audit_event where object_id = ? and action = ?"
                + " and outcome = 'SUCCESS'", Integer.class, planId.toString(), action);
    }

}
