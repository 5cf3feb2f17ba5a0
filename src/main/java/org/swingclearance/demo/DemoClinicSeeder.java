package org.swingclearance.demo;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.util.EnumSet;
import java.util.UUID;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.context.annotation.Profile;
import org.springframework.core.annotation.Order;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Component;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.identity.Clinic;
import org.swingclearance.identity.ClinicRepository;
import org.swingclearance.identity.StaffAccount;
import org.swingclearance.identity.StaffAccountRepository;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.Episode;
import org.swingclearance.patient.EpisodeRepository;
import org.swingclearance.patient.Hand;
import org.swingclearance.patient.Patient;
import org.swingclearance.patient.PatientDetails;
import org.swingclearance.patient.PatientRepository;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.patient.RedFlagCheck;
import org.swingclearance.patient.RedFlagCheckRepository;
import org.swingclearance.patient.RedFlagContext;
import org.swingclearance.patient.Region;
import org.swingclearance.patient.Sex;
import org.swingclearance.patient.ShareConsent;
import org.swingclearance.patient.ShareConsentRepository;
import org.swingclearance.patient.Side;

/** Seeds the invented demo clinics, accounts and patients once; a second start finds them and does nothing. */
@Component
@Profile("demo")
@Order(DemoIds.ORDER_CLINICS)
class DemoClinicSeeder implements ApplicationRunner {

    private final ClinicRepository clinics;
    private final StaffAccountRepository accounts;
    private final PatientRepository patients;
    private final EpisodeRepository episodes;
    private final RedFlagCheckRepository redFlags;
    private final ShareConsentRepository consents;
    private final PasswordEncoder encoder;
    private final Clock clock;
    private final String password;

    DemoClinicSeeder(ClinicRepository clinics, StaffAccountRepository accounts, PatientRepository patients,
                     EpisodeRepository episodes, RedFlagCheckRepository redFlags, ShareConsentRepository consents,
                     PasswordEncoder encoder, Clock clock, @Value("${clearance.demo.password}") String password) {
        this.clinics = clinics;
        this.accounts = accounts;
        this.patients = patients;
        this.episodes = episodes;
        this.redFlags = redFlags;
        this.consents = consents;
        this.encoder = encoder;
        this.clock = clock;
        this.password = password;
    }

    @Override
    @Transactional
    public void run(ApplicationArguments args) {
        if (clinics.existsById(DemoIds.CLINIC)) {
            return;
        }
        Instant now = clock.instant();
        LocalDate today = LocalDate.now(clock);
        Clinic demo = new Clinic(DemoIds.CLINIC, "Demo Strength Club Partner Clinic", now);
        demo.setContact("+00 000 000 001", "desk@demo.local", "1 Example Yard, Demo Town");
        clinics.save(demo);
        Clinic other = new Clinic(DemoIds.OTHER_CLINIC, "Other Demo Clinic", now);
        other.setContact("+00 000 000 002", "desk@other.demo.local", "2 Sample Row, Demo Town");
        clinics.save(other);

        String hash = encoder.encode(password);
        staff(DemoIds.CLINICIAN, DemoIds.CLINIC, "clinician@demo.local", "Robin Vale (physiotherapist)", StaffRole.CLINICIAN, hash, now);
        staff(DemoIds.TRAINER, DemoIds.CLINIC, "trainer@demo.local", "Sasha Quill (trainer)", StaffRole.TRAINER, hash, now);
        staff(DemoIds.SECOND_TRAINER, DemoIds.CLINIC, "trainer2@demo.local", "Jun Arbor (trainer)", StaffRole.TRAINER, hash, now);
        staff(DemoIds.MANAGER, DemoIds.CLINIC, "manager@demo.local", "Kit Marlow (clinic manager)", StaffRole.MANAGER, hash, now);
        staff(DemoIds.ADMIN, DemoIds.CLINIC, "admin@demo.local", "Lee Harrow (administrator)", StaffRole.ADMIN, hash, now);
        staff(DemoIds.OTHER_CLINICIAN, DemoIds.OTHER_CLINIC, "clinician@other.demo.local", "Noor Elm (physiotherapist)", StaffRole.CLINICIAN, hash, now);

        patient(DemoIds.PATIENT_SHOULDER, DemoIds.CLINIC, new PatientDetails("DEMO-001", "Alex Demo-Shoulder",
                today.minusYears(41).minusDays(30), Sex.MALE, 1.78, 80, Hand.RIGHT, "Phone on file"), now);
        episode(DemoIds.EPISODE_SHOULDER, DemoIds.CLINIC, DemoIds.PATIENT_SHOULDER, Region.SHOULDER, Side.RIGHT,
                today.minusWeeks(14), true, "Back to two-hand and one-hand club swinging three times a week", now);
        consents.save(new ShareConsent(UUID.fromString("00000000-0000-4000-8000-000000031001"), DemoIds.CLINIC,
                DemoIds.PATIENT_SHOULDER, "Sasha Quill", "trainer@demo.local", today.minusDays(3), DemoIds.CLINICIAN, now));

        patient(DemoIds.PATIENT_BACK, DemoIds.CLINIC, new PatientDetails("DEMO-002", "Bea Demo-Back",
                today.minusYears(35).minusDays(100), Sex.FEMALE, 1.65, 62, Hand.RIGHT, null), now);
        episode(DemoIds.EPISODE_BACK, DemoIds.CLINIC, DemoIds.PATIENT_BACK, Region.LUMBOPELVIC, null,
                today.minusWeeks(10), false, "Return to hip-driven two-hand swings without flare-ups", now);

        patient(DemoIds.PATIENT_BOTH, DemoIds.CLINIC, new PatientDetails("DEMO-003", null,
                today.minusYears(52).minusDays(12), Sex.OTHER, 1.72, 74, Hand.LEFT, null), now);
        episode(DemoIds.EPISODE_BOTH, DemoIds.CLINIC, DemoIds.PATIENT_BOTH, Region.BOTH, Side.LEFT,
                today.minusWeeks(20), false, "Light club work for general fitness", now);

        patient(DemoIds.PATIENT_HOLD, DemoIds.CLINIC, new PatientDetails("DEMO-004", "Cam Demo-Hold",
                today.minusYears(63), Sex.MALE, 1.80, 88, Hand.RIGHT, null), now);
        episode(DemoIds.EPISODE_HOLD, DemoIds.CLINIC, DemoIds.PATIENT_HOLD, Region.SHOULDER, Side.LEFT,
                today.minusWeeks(2), false, "Resume club swinging after a fall", now);
        redFlags.save(new RedFlagCheck(UUID.fromString("00000000-0000-4000-8000-000000041004"), DemoIds.CLINIC,
                DemoIds.EPISODE_HOLD, RedFlagContext.INTAKE, EnumSet.of(RedFlag.SHOULDER_TRAUMA_WEAKNESS), now.plusSeconds(1),
                DemoIds.CLINICIAN));

        patient(DemoIds.OTHER_PATIENT, DemoIds.OTHER_CLINIC, new PatientDetails("OTHER-001", "Dana Other-Clinic",
                today.minusYears(30), Sex.FEMALE, 1.70, 65, Hand.RIGHT, null), now);
        episode(DemoIds.OTHER_EPISODE, DemoIds.OTHER_CLINIC, DemoIds.OTHER_PATIENT, Region.SHOULDER, Side.LEFT,
                today.minusWeeks(8), false, "Return to swinging", now);
    }

    private void staff(UUID id, UUID clinic, String email, String name, StaffRole role, String hash, Instant now) {
        accounts.save(new StaffAccount(id, clinic, email, name, role, hash, now));
    }

    private void patient(UUID id, UUID clinic, PatientDetails details, Instant now) {
        patients.save(new Patient(id, clinic, details, now));
    }

    private void episode(UUID id, UUID clinic, UUID patient, Region region, Side side, LocalDate injury,
                         boolean surgery, String goal, Instant now) {
        episodes.save(new Episode(id, clinic, patient, region, side, injury, surgery, goal, now, DemoIds.CLINICIAN));
        redFlags.save(new RedFlagCheck(UUID.nameUUIDFromBytes(("intake-" + id).getBytes()), clinic, id,
                RedFlagContext.INTAKE, EnumSet.noneOf(RedFlag.class), now, DemoIds.CLINICIAN));
    }
}
