package org.swingclearance.identity;

import java.time.Clock;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/** The clinic administrator's work on staff accounts, and each user's own preferences. */
@Service
public class StaffAccounts {

    private final StaffAccountRepository accounts;
    private final ClinicRepository clinics;
    private final PasswordEncoder encoder;
    private final AuditLog audit;
    private final Clock clock;

    StaffAccounts(StaffAccountRepository accounts, ClinicRepository clinics, PasswordEncoder encoder, AuditLog audit,
                  Clock clock) {
        this.accounts = accounts;
        this.clinics = clinics;
        this.encoder = encoder;
        this.audit = audit;
        this.clock = clock;
    }

    @Transactional(readOnly = true)
    public List<StaffView> list(CurrentStaff admin) {
        return accounts.findByClinicIdOrderByDisplayName(admin.clinicId()).stream().map(StaffView::of).toList();
    }

    /** Enabled staff of one role in the caller's clinic (for example the trainers a plan can be shared with). */
    @Transactional(readOnly = true)
    public List<StaffView> activeOfRole(CurrentStaff staff, StaffRole role) {
        return accounts.findByClinicIdAndRoleAndEnabledTrueOrderByDisplayName(staff.clinicId(), role).stream()
                .map(StaffView::of).toList();
    }

    @Transactional(readOnly = true)
    public Optional<StaffView> find(CurrentStaff staff, UUID id) {
        return accounts.findByIdAndClinicId(id, staff.clinicId()).map(StaffView::of);
    }

    @Transactional(readOnly = true)
    public String clinicName(UUID clinicId) {
        return clinics.findById(clinicId).map(Clinic::getName).orElse("");
    }

    /** The clinic's name and contact details, for handouts and page headers. */
    @Transactional(readOnly = true)
    public Optional<Clinic> clinic(UUID clinicId) {
        return clinics.findById(clinicId);
    }

    @Transactional
    public UUID create(CurrentStaff admin, String email, String displayName, StaffRole role, String password) {
        if (accounts.findByEmail(email.trim()).isPresent()) {
            throw new InvalidStateException("staff.error.emailTaken");
        }
        requireGoodPassword(password, email);
        StaffAccount account = new StaffAccount(UUID.randomUUID(), admin.clinicId(), email, displayName.trim(), role,
                encoder.encode(password), clock.instant());
        accounts.save(account);
        audit.record(admin, "STAFF_CREATE", "StaffAccount", account.getId(), null, "role=" + role);
        return account.getId();
    }

    @Transactional
    public void update(CurrentStaff admin, UUID id, long expectedVersion, String displayName, StaffRole role,
                       boolean enabled) {
        StaffAccount account = load(admin, id);
        if (account.getVersion() != expectedVersion) {
            throw new ConflictException("staff account");
        }
        if (account.getId().equals(admin.staffId()) && (!enabled || role != StaffRole.ADMIN)) {
            throw new InvalidStateException("staff.error.selfLockout");
        }
        account.update(displayName.trim(), role, enabled);
        accounts.saveAndFlush(account);
        audit.record(admin, "STAFF_UPDATE", "StaffAccount", id, null, "role=" + role + ",enabled=" + enabled);
    }

    @Transactional
    public void resetPassword(CurrentStaff admin, UUID id, String password) {
        StaffAccount account = load(admin, id);
        requireGoodPassword(password, account.getEmail());
        account.changePasswordHash(encoder.encode(password));
        audit.record(admin, "STAFF_PASSWORD_RESET", "StaffAccount", id, null, null);
    }

    @Transactional
    public void setUnitSystem(CurrentStaff self, UnitSystem unitSystem) {
        StaffAccount account = load(self, self.staffId());
        account.setUnitSystem(unitSystem);
        audit.record(self, "PREFERENCES_UPDATE", "StaffAccount", self.staffId(), null, "units=" + unitSystem);
    }

    private void requireGoodPassword(String password, String email) {
        PasswordPolicy.violation(password, email).ifPresent(key -> {
            throw new InvalidStateException(key);
        });
    }

    private StaffAccount load(CurrentStaff staff, UUID id) {
        return accounts.findByIdAndClinicId(id, staff.clinicId()).orElseThrow(() -> {
            audit.recordDenied(staff, "STAFF_READ", "StaffAccount", id, "not in caller's clinic or missing");
            return new NotFoundException("staff account");
        });
    }
}
