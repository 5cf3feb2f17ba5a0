package org.swingclearance.support;

import java.time.Instant;
import java.time.LocalDate;
import java.util.EnumMap;
import java.util.Map;
import java.util.UUID;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors;
import org.springframework.test.web.servlet.request.RequestPostProcessor;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.identity.Clinic;
import org.swingclearance.identity.ClinicRepository;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffAccount;
import org.swingclearance.identity.StaffAccountRepository;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.identity.UnitSystem;
import org.swingclearance.patient.EpisodeDetails;
import org.swingclearance.patient.Hand;
import org.swingclearance.patient.PatientDetails;
import org.swingclearance.patient.Patients;
import org.swingclearance.patient.Region;
import org.swingclearance.patient.Sex;
import org.swingclearance.patient.Side;

/**
 * Builds fresh, isolated test data: a new clinic with one account per role (all with {@link #PASSWORD}), and
 * patients with episodes through the real service. Each call makes new ids, so tests never share records.
 * The password hash is computed once per JVM: Argon2 is deliberately slow.
 */
public class TestData {

    public static final String PASSWORD = "a long test password for everyone";

    private static volatile String passwordHash;

    private final ClinicRepository clinics;
    private final StaffAccountRepository accounts;
    private final Patients patients;
    private final PasswordEncoder encoder;
    private final TransactionTemplate tx;
    private final UserDetailsService users;

    TestData(ClinicRepository clinics, StaffAccountRepository accounts, Patients patients, PasswordEncoder encoder,
             TransactionTemplate tx, UserDetailsService users) {
        this.users = users;
        this.clinics = clinics;
        this.accounts = accounts;
        this.patients = patients;
        this.encoder = encoder;
        this.tx = tx;
    }

    /** A clinic and its staff, one account per role; e-mails are unique per call. */
    public record TestClinic(UUID id, String name, Map<StaffRole, CurrentStaff> staff) {

        public CurrentStaff clinician() { return staff.get(StaffRole.CLINICIAN); }
        public CurrentStaff trainer() { return staff.get(StaffRole.TRAINER); }
        public CurrentStaff manager() { return staff.get(StaffRole.MANAGER); }
        public CurrentStaff admin() { return staff.get(StaffRole.ADMIN); }
        public String email(StaffRole role) { return staff.get(role).email(); }
    }

    public TestClinic clinic() {
        String tag = UUID.randomUUID().toString().substring(0, 8);
        UUID clinicId = UUID.randomUUID();
        String name = "Test Clinic " + tag;
        Map<StaffRole, CurrentStaff> staff = new EnumMap<>(StaffRole.class);
        tx.executeWithoutResult(s -> {
            Clinic clinic = new Clinic(clinicId, name, Instant.now());
            clinic.setContact("+00 000", "desk-" + tag + "@test.local", "Test Street 1");
            clinics.save(clinic);
            for (StaffRole role : StaffRole.values()) {
                staff.put(role, account(clinicId, role, role.name().toLowerCase() + "-" + tag + "@test.local"));
            }
        });
        return new TestClinic(clinicId, name, staff);
    }

    /** Another account of a role in an existing clinic (for example a second trainer). */
    public CurrentStaff account(UUID clinicId, StaffRole role, String email) {
        StaffAccount account = new StaffAccount(UUID.randomUUID(), clinicId, email, role.name() + " " + email, role,
                hash(), Instant.now());
        tx.executeWithoutResult(s -> accounts.save(account));
        return new CurrentStaff(account.getId(), clinicId, role, account.getEmail(), account.getDisplayName(),
                UnitSystem.METRIC);
    }

    /** A patient like the CASE-M80 body of biomechanics.md (1.78 m, 80 kg), with a code unique per call. */
    public UUID patient(TestClinic clinic) {
        return patients.create(clinic.clinician(), new PatientDetails("T-" + UUID.randomUUID().toString().substring(0, 8),
                "Test Patient", LocalDate.of(1985, 5, 20), Sex.MALE, 1.78, 80, Hand.RIGHT, null));
    }

    /** A right-shoulder episode without red flags for the patient. */
    public UUID shoulderEpisode(TestClinic clinic, UUID patientId) {
        return patients.openEpisode(clinic.clinician(), patientId, new EpisodeDetails(Region.SHOULDER, Side.RIGHT,
                LocalDate.now().minusWeeks(12), false, "Return to club swinging", java.util.Set.of()));
    }

    /** MockMvc: act as this staff member (the real principal, loaded the way sign-in loads it). */
    public RequestPostProcessor as(CurrentStaff staff) {
        return SecurityMockMvcRequestPostProcessors.user(users.loadUserByUsername(staff.email()));
    }

    private String hash() {
        if (passwordHash == null) {
            passwordHash = encoder.encode(PASSWORD);
        }
        return passwordHash;
    }
}
