package org.swingclearance.plan;

import java.time.Instant;
import java.util.Optional;
import java.util.UUID;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Component;
import org.swingclearance.identity.StaffAccount;
import org.swingclearance.identity.StaffAccountRepository;
import org.swingclearance.identity.StaffRole;

/**
 * Opens the trainer account an invitation leads to. The administrator's account service needs a signed-in
 * administrator; an invitation has none, only the clinician's earlier decision recorded with the invitation, so the
 * account is written here, in the invitation's clinic and always with the TRAINER role.
 */
@Component
class InvitedTrainerAccounts {

    private final StaffAccountRepository accounts;
    private final PasswordEncoder encoder;

    InvitedTrainerAccounts(StaffAccountRepository accounts, PasswordEncoder encoder) {
        this.accounts = accounts;
        this.encoder = encoder;
    }

    boolean emailTaken(String email) {
        return accounts.findByEmail(email.trim()).isPresent();
    }

    /** The new account; the caller has checked the password against the policy and the e-mail for uniqueness. */
    StaffAccount open(UUID clinicId, String email, String displayName, String password, Instant at) {
        StaffAccount account = new StaffAccount(UUID.randomUUID(), clinicId, email, displayName.trim(),
                StaffRole.TRAINER, encoder.encode(password), at);
        return accounts.saveAndFlush(account);
    }

    Optional<StaffAccount> find(UUID id) {
        return accounts.findById(id);
    }
}
