package org.swingclearance.plan;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import org.swingclearance.equipment.ClubDetails;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.equipment.InertiaMethod;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.Patients;
import org.swingclearance.screening.Decision;
import org.swingclearance.screening.FullScreening;
import org.swingclearance.screening.MeasurementReading;
import org.swingclearance.screening.Screenings;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * Test data for plan tests, built through the real services: a clinic with its staff, three clubs of the CASE-M80
 * shape (biomechanics.md §0.1: 0.60 m, balance point 0.45 m, head centre 0.50 m) at 4.0, 4.3 and 4.6 kg (close
 * enough that a change of club stays within the +10 % step limit), a patient of
 * the CASE-M80 body with a right-shoulder episode and a signed screening (Contract S, through the screening
 * service), and settings for the built-in one-hand front arc. Public for other features' tests that need a real
 * issued and shared plan (the audit sweep).
 */
public final class PlanScenario {

    /** Built-in "two-hand front pendulum, low" (V31): centre 0°, half-arc 45°, two hands, rhythmic, not hip-driven. */
    static final UUID TWO_HAND_LOW_PENDULUM = UUID.fromString("00000000-0000-4000-8000-00000000a002");

    /** The screening's band decisions carry these reasons: clinical text a trainer must never see. */
    static final String SHOULDER_OVERRIDE_REASON = "Tolerates two-hand carries at this level";
    static final String LUMBOPELVIC_OVERRIDE_REASON = "No lumbar symptoms during the last month of training";

    final TestClinic clinic;
    final UUID patientId;
    final UUID episodeId;
    final List<UUID> clubs;

    private PlanScenario(TestClinic clinic, UUID patientId, UUID episodeId, List<UUID> clubs) {
        this.clinic = clinic;
        this.patientId = patientId;
        this.episodeId = episodeId;
        this.clubs = clubs;
    }

    /** A fresh clinic, inventory, patient and episode with a signed screening. */
    public static PlanScenario create(TestData data, Clubs clubService, Screenings screenings) {
        TestClinic clinic = data.clinic();
        CurrentStaff clinician = clinic.clinician();
        List<UUID> inventory = List.of(
                clubService.create(clinician, club("Club 4.0 kg", 4.0)),
                clubService.create(clinician, club("Club 4.3 kg", 4.3)),
                clubService.create(clinician, club("Club 4.6 kg", 4.6)));
        UUID patient = data.patient(clinic);
        UUID episode = data.shoulderEpisode(clinic, patient);
        signScreening(screenings, clinician, episode);
        return new PlanScenario(clinic, patient, episode, inventory);
    }

    public TestClinic clinic() {
        return clinic;
    }

    public UUID patientId() {
        return patientId;
    }

    public UUID episodeId() {
        return episodeId;
    }

    CurrentStaff clinician() {
        return clinic.clinician();
    }

    CurrentStaff trainer() {
        return clinic.trainer();
    }

    /** Settings like the page's defaults: no target, 3 sessions per step at 3 a week, Band 2 dose 3 × 10 @ 4. */
    PlanSettings settings(PlanDrafting drafting) {
        return drafting.defaults(clinician(), TWO_HAND_LOW_PENDULUM, LocalDate.now().minusDays(8));
    }

    /**
     * For tests outside this package: the plan generated with the {@link #settings} defaults (taken from the plan
     * page, which offers the same), issued, and shared with the clinic's trainer on the patient's consent.
     */
    public UUID issuedAndSharedPlan(Plans plans, Patients patients) {
        PlanSettings d = plans.page(clinician(), episodeId).defaults();
        UUID planId = plans.generate(clinician(), episodeId, new PlanSettings(TWO_HAND_LOW_PENDULUM, d.target(),
                d.continueProvisionally(), d.stepUnit(), d.stepLength(), d.sessionsPerWeek(),
                LocalDate.now().minusDays(8), d.doses()));
        plans.issue(clinician(), planId, plans.page(clinician(), episodeId).draft().lockVersion());
        consentForTrainer(patients);
        plans.share(clinician(), planId, trainer().staffId());
        return planId;
    }

    /** The patient's consent to share with the clinic's trainer, recorded by e-mail. */
    UUID consentForTrainer(Patients patients) {
        return patients.recordConsent(clinician(), patientId, trainer().displayName(), trainer().email(),
                LocalDate.now());
    }

    /**
     * Signs a complete right-shoulder screening through the screening service, Band 2 for both regions. Values as in
     * the screening feature's worked examples (clinical.md), except a stronger shoulder: flexion force 320 / 300 N
     * at a 0.30 m lever arm, so 96 / 90 N·m (the weaker, right side, counts for two-hand patterns).
     */
    static void signScreening(Screenings screenings, CurrentStaff clinician, UUID episodeId) {
        UUID id = screenings.start(clinician, episodeId);
        screenings.saveDraft(clinician, id, screenings.page(clinician, id).shown().lockVersion(),
                MeasurementReading.of(typedScreening(), Set.of()).measurements());
        screenings.sign(clinician, id, screenings.page(clinician, id).shown().lockVersion(),
                new Decision("BAND_2", SHOULDER_OVERRIDE_REASON, "BAND_2", LUMBOPELVIC_OVERRIDE_REASON));
    }

    /** The screening feature's worked-example battery with a stronger, less irritable shoulder (see above). */
    static Map<String, String> typedScreening() {
        Map<String, String> v = FullScreening.typed();
        v.put("SHOULDER_FLEXION_FORCE_LEFT", "320");
        v.put("SHOULDER_FLEXION_FORCE_RIGHT", "300");
        v.put("SHOULDER_FLEXION_LEVER_ARM_LEFT", "0.30");
        v.put("SHOULDER_FLEXION_LEVER_ARM_RIGHT", "0.30");
        v.put("SHOULDER_FLEXION_ACTIVE_RIGHT", "160");
        v.put("GRIP_TRIAL_1_RIGHT", "40");
        v.put("GRIP_TRIAL_2_RIGHT", "41");
        v.put("GRIP_TRIAL_3_RIGHT", "40");
        v.put("PAIN_AT_REST", "1");
        v.put("PAIN_DURING_MOVEMENT", "2");
        v.put("PAIN_WORST_24H", "3");
        // the plan tests were written against the shoulder-to-grip distance estimated from stature
        v.remove("SHOULDER_TO_GRIP_DISTANCE_LEFT");
        v.remove("SHOULDER_TO_GRIP_DISTANCE_RIGHT");
        return v;
    }

    private static ClubDetails club(String name, double massKg) {
        return new ClubDetails(name, massKg, 0.60, 0.45, 0.20, 0.50, InertiaMethod.HEAD_MODEL, null);
    }
}
