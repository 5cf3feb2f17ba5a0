package org.swingclearance.screening;

import java.time.Clock;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.UUID;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.context.annotation.Profile;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.demo.DemoIds;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffAccounts;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.identity.UnitSystem;
import org.swingclearance.patient.Patients;
import org.swingclearance.rules.PracticeRules;

/**
 * Seeds invented demo screenings once, through the real service so every value, finding and band is the engine's:
 * the shoulder patient has two signed screenings six weeks apart (trend and change since the previous one, the
 * second with an overridden band), the low-back patient one signed screening, the two-region patient a draft.
 */
@Component
@Profile("demo")
@Order(DemoIds.ORDER_CLINICS + 20)
class DemoScreeningSeeder implements ApplicationRunner {

    private static final CurrentStaff CLINICIAN = new CurrentStaff(DemoIds.CLINICIAN, DemoIds.CLINIC,
            StaffRole.CLINICIAN, "clinician@demo.local", "Robin Vale (physiotherapist)", UnitSystem.METRIC);

    private final ScreeningRepository screeningRepository;
    private final ScreeningVersionRepository versionRepository;
    private final Patients patients;
    private final PracticeRules rules;
    private final StaffAccounts staffAccounts;
    private final AuditLog audit;
    private final Clock clock;
    private final TransactionTemplate tx;

    DemoScreeningSeeder(ScreeningRepository screeningRepository, ScreeningVersionRepository versionRepository,
                        Patients patients, PracticeRules rules, StaffAccounts staffAccounts, AuditLog audit,
                        Clock clock, TransactionTemplate tx) {
        this.screeningRepository = screeningRepository;
        this.versionRepository = versionRepository;
        this.patients = patients;
        this.rules = rules;
        this.staffAccounts = staffAccounts;
        this.audit = audit;
        this.clock = clock;
        this.tx = tx;
    }

    @Override
    public void run(ApplicationArguments args) {
        if (!screeningRepository.findByClinicIdAndEpisodeIdOrderByCreatedAtAsc(DemoIds.CLINIC,
                DemoIds.EPISODE_SHOULDER).isEmpty()) {
            return;
        }
        tx.executeWithoutResult(status -> {
            // The same service, with its clock set back, so the first screening carries an earlier date.
            Screenings earlier = service(Clock.offset(clock, Duration.ofDays(-42)));
            Screenings today = service(clock);
            signed(earlier, DemoIds.EPISODE_SHOULDER, shoulder(150, 40, 140, 36, 24, new int[] {4, 3, 3, 3, 4, 3, 3, 4, 3, 3, 3}),
                    Decision.confirmAll());
            signed(today, DemoIds.EPISODE_SHOULDER, shoulder(165, 58, 165, 41, 27, new int[] {2, 2, 2, 2, 3, 2, 2, 2, 2, 2, 1}),
                    new Decision("BAND_3", "Six pain-free weeks of light club work; strength within 5 % of the other side",
                            null, null));
            signed(today, DemoIds.EPISODE_BACK, back(), Decision.confirmAll());
            UUID draft = today.start(CLINICIAN, DemoIds.EPISODE_BOTH);
            Map<String, String> partial = new LinkedHashMap<>();
            partial.put("PAIN_AT_REST", "1");
            partial.put("PAIN_DURING_MOVEMENT", "3");
            partial.put("SHOULDER_FLEXION_ACTIVE_LEFT", "158");
            partial.put("SHOULDER_FLEXION_ACTIVE_RIGHT", "172");
            today.saveDraft(CLINICIAN, draft, lock(today, draft), read(partial));
        });
    }

    private Screenings service(Clock at) {
        return new Screenings(screeningRepository, versionRepository, patients, rules, staffAccounts, audit, at);
    }

    private void signed(Screenings service, UUID episode, Map<String, String> typed, Decision decision) {
        UUID id = service.start(CLINICIAN, episode);
        service.saveDraft(CLINICIAN, id, lock(service, id), read(typed));
        service.sign(CLINICIAN, id, lock(service, id), decision);
    }

    private static long lock(Screenings service, UUID id) {
        return service.page(CLINICIAN, id).shown().lockVersion();
    }

    private static Measurements read(Map<String, String> typed) {
        MeasurementReading reading = MeasurementReading.of(typed, Set.of());
        if (!reading.valid()) {
            throw new IllegalStateException("demo screening values are invalid: " + reading.problems());
        }
        return reading.measurements();
    }

    /** An invented right-shoulder screening; the involved side improves between the two dates. */
    private static Map<String, String> shoulder(int flexionRight, int irRight, double forceRight, double gripRight,
                                                int ckcuest, int[] quickDash) {
        Map<String, String> v = new LinkedHashMap<>();
        v.put("PAIN_AT_REST", "1");
        v.put("PAIN_DURING_MOVEMENT", "3");
        v.put("PAIN_WORST_24H", "4");
        sides(v, "SHOULDER_FLEXION_ACTIVE", "172", String.valueOf(flexionRight));
        sides(v, "SHOULDER_ABDUCTION_ACTIVE", "176", String.valueOf(flexionRight + 5));
        sides(v, "SHOULDER_EXTENSION_ACTIVE", "58", "52");
        sides(v, "SHOULDER_ER_90_ACTIVE", "96", "98");
        sides(v, "SHOULDER_IR_90_ACTIVE", "62", String.valueOf(irRight));
        sides(v, "SHOULDER_FLEXION_FORCE", "170", String.valueOf(forceRight));
        sides(v, "SHOULDER_FLEXION_LEVER_ARM", "0.30", "0.30");
        sides(v, "SHOULDER_ER_FORCE", "140", String.valueOf(forceRight - 20));
        sides(v, "SHOULDER_ER_LEVER_ARM", "0.26", "0.26");
        sides(v, "SHOULDER_IR_FORCE", "165", String.valueOf(forceRight));
        sides(v, "SHOULDER_IR_LEVER_ARM", "0.26", "0.26");
        sides(v, "GRIP_TRIAL_1", "44", String.valueOf(gripRight - 2));
        sides(v, "GRIP_TRIAL_2", "45", String.valueOf(gripRight));
        sides(v, "GRIP_TRIAL_3", "44", String.valueOf(gripRight - 1));
        v.put("CKCUEST_TRIAL_1", String.valueOf(ckcuest - 1));
        v.put("CKCUEST_TRIAL_2", String.valueOf(ckcuest));
        v.put("CKCUEST_TRIAL_3", String.valueOf(ckcuest + 1));
        sides(v, "SHOULDER_TO_GRIP_DISTANCE", "64", "64");
        for (int i = 0; i < quickDash.length; i++) {
            v.put("QUICKDASH_" + (i + 1), String.valueOf(quickDash[i]));
        }
        return v;
    }

    /** An invented low-back screening, with the shoulder measured for the club limits (dominant right hand). */
    private static Map<String, String> back() {
        Map<String, String> v = new LinkedHashMap<>();
        v.put("PAIN_AT_REST", "2");
        v.put("PAIN_DURING_MOVEMENT", "4");
        v.put("PAIN_WORST_24H", "5");
        v.put("SCHOBER_INCREASE", "4.5");
        sides(v, "HIP_IR", "34", "31");
        sides(v, "HIP_ER", "41", "43");
        sides(v, "STRAIGHT_LEG_RAISE", "78", "82");
        v.put("TRUNK_FLEXOR_HOLD", "95");
        v.put("TRUNK_EXTENSOR_HOLD", "140");
        sides(v, "SIDE_BRIDGE_HOLD", "62", "66");
        sides(v, "ASLR", "1", "0");
        v.put("PIT_PAIN_POSITION_1", "1");
        v.put("PIT_EASED_POSITION_2", "1");
        v.put("ABERRANT_LUMBAR_FLEXION", "1");
        sides(v, "SINGLE_LEG_STANCE", "40", "38");
        sides(v, "SHOULDER_FLEXION_ACTIVE", "168", "170");
        sides(v, "SHOULDER_FLEXION_FORCE", "120", "126");
        sides(v, "SHOULDER_FLEXION_LEVER_ARM", "0.27", "0.27");
        sides(v, "GRIP_TRIAL_1", "29", "31");
        sides(v, "GRIP_TRIAL_2", "30", "32");
        sides(v, "GRIP_TRIAL_3", "29", "31");
        int[] odi = {2, 1, 2, 1, 1, 2, 1, 0, 1, 1};
        for (int i = 0; i < odi.length; i++) {
            v.put("ODI_" + (i + 1), String.valueOf(odi[i]));
        }
        int[] quickDash = {1, 1, 2, 1, 1, 1, 1, 1, 1, 1, 1};
        for (int i = 0; i < quickDash.length; i++) {
            v.put("QUICKDASH_" + (i + 1), String.valueOf(quickDash[i]));
        }
        return v;
    }

    private static void sides(Map<String, String> v, String measurement, String left, String right) {
        v.put(measurement + "_LEFT", left);
        v.put(measurement + "_RIGHT", right);
    }
}
