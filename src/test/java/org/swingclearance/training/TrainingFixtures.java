package org.swingclearance.training;

import java.sql.Timestamp;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.UUID;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.Patients;
import org.swingclearance.plan.Plans;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * An issued plan for the training tests, shared with the clinic's trainer through the plan feature's real sharing
 * (consent recorded, then {@link Plans#share}). The plan rows themselves are written directly: generating a plan
 * needs a signed screening and an envelope, which the plan feature's own tests cover. Invented data.
 */
public class TrainingFixtures {

    /** The plan started this many days before today. */
    public static final int START_DAYS_AGO = 20;

    private final TestData data;
    private final JdbcTemplate jdbc;
    private final Patients patients;
    private final Plans plans;
    private final TransactionTemplate tx;

    public TrainingFixtures(TestData data, JdbcTemplate jdbc, Patients patients, Plans plans, TransactionTemplate tx) {
        this.data = data;
        this.jdbc = jdbc;
        this.patients = patients;
        this.plans = plans;
        this.tx = tx;
    }

    /** A patient, a shoulder episode and its issued plan started {@link #START_DAYS_AGO} days ago, shared. */
    public SharedPlan sharedPlan(TestClinic clinic, CurrentStaff... trainers) {
        return sharedPlan(clinic, START_DAYS_AGO, trainers);
    }

    /** A patient, a shoulder episode and its issued plan started {@code daysAgo} days ago, shared with the trainers. */
    public SharedPlan sharedPlan(TestClinic clinic, int daysAgo, CurrentStaff... trainers) {
        UUID patientId = data.patient(clinic);
        UUID episodeId = data.shoulderEpisode(clinic, patientId);
        LocalDate start = LocalDate.now(ZoneOffset.UTC).minusDays(daysAgo);
        UUID planId = issuedPlan(clinic, patientId, episodeId, start);
        for (CurrentStaff trainer : trainers) {
            share(clinic, patientId, planId, trainer);
        }
        return new SharedPlan(patientId, episodeId, planId, start);
    }

    /** Shares the plan with a trainer, recording the patient's consent first. */
    public void share(TestClinic clinic, UUID patientId, UUID planId, CurrentStaff trainer) {
        patients.recordConsent(clinic.clinician(), patientId, trainer.displayName(), trainer.email(),
                LocalDate.now(ZoneOffset.UTC).minusDays(30));
        plans.share(clinic.clinician(), planId, trainer.staffId());
    }

    /**
     * Steps a week apart: 1 light club (4 kg), grip 20 cm, 2.5 s, D 0.18; 2 grip 15 cm, D 0.20; 3 cycle 2.0 s,
     * D 0.22; 4 heavy club (6 kg), D 0.24, provisional behind a re-screen gate. Three sessions a week.
     */
    private UUID issuedPlan(TestClinic clinic, UUID patientId, UUID episodeId, LocalDate start) {
        UUID planId = UUID.randomUUID();
        UUID versionId = UUID.randomUUID();
        UUID light = UUID.randomUUID();
        UUID heavy = UUID.randomUUID();
        Timestamp now = Timestamp.from(Instant.now());
        UUID clinician = clinic.clinician().staffId();
        tx.executeWithoutResult(s -> {
            jdbc.update("insert into plan (id, clinic_id, episode_id, patient_id, created_at, created_by)"
                    + " values (?, ?, ?, ?, ?, ?)", planId, clinic.id(), episodeId, patientId, now, clinician);
            jdbc.update("""
                    insert into plan_version (id, clinic_id, plan_id, number, status, source_screening_id,
                        source_screening_version, rules_version, engine_version, band, pattern_id, pattern_name,
                        continue_provisionally, step_unit, step_length, sessions_per_week, starts_on, step_limit,
                        pain_during_limit, inputs, created_at, created_by)
                    values (?, ?, ?, 1, 'DRAFT', ?, 1, 1, 'test', 'BAND_2', ?, 'Two-hand front pendulum', false,
                        'DAYS', 7, 3, ?, 0.10, 5, '{}', ?, ?)""",
                    versionId, clinic.id(), planId, UUID.randomUUID(), UUID.randomUUID(), start, now, clinician);
            step(versionId, 1, light, "Light club", 4.0, 20.0, 2.5, null, 0.18, false, start);
            step(versionId, 2, light, "Light club", 4.0, 15.0, 2.5, "GRIP_MARK", 0.20, false, start.plusDays(7));
            step(versionId, 3, light, "Light club", 4.0, 15.0, 2.0, "CYCLE_TIME", 0.22, false, start.plusDays(14));
            step(versionId, 4, heavy, "Heavy club", 6.0, 15.0, 2.0, "CLUB", 0.24, true, start.plusDays(21));
            jdbc.update("update plan_version set status = 'ISSUED', issued_at = ?, issued_by = ?, content_sha256 = ?"
                    + " where id = ?", now, clinician, "0".repeat(64), versionId);
        });
        return planId;
    }

    private void step(UUID versionId, int number, UUID club, String name, double mass, double grip, double cycle,
                      String dial, double d, boolean provisional, LocalDate startsOn) {
        jdbc.update("""
                insert into plan_step (plan_version_id, number, club_id, club_name, club_mass_kg, grip_mark_cm,
                    cycle_time_s, changed_dial, sets, reps, effort_cap, demand_ratio, rise, binding_constraint,
                    provisional, gate, pinned, starts_on)
                values (?, ?, ?, ?, ?, ?, ?, ?, 3, 10, 5, ?, 0.1, 'C1', ?, ?, false, ?)""",
                versionId, number, club, name, mass, grip, cycle, dial, d, provisional,
                provisional ? "RESCREEN_BEFORE" : "NONE", startsOn);
    }

    /** What a test needs of a shared plan. */
    public record SharedPlan(UUID patientId, UUID episodeId, UUID planId, LocalDate startsOn) {
    }
}
