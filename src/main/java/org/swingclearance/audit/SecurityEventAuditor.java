package org.swingclearance.audit;

import org.springframework.context.event.EventListener;
import org.springframework.security.authentication.event.AbstractAuthenticationFailureEvent;
import org.springframework.security.authentication.event.AuthenticationSuccessEvent;
import org.springframework.security.authorization.event.AuthorizationDeniedEvent;
import org.springframework.security.core.Authentication;
import org.springframework.stereotype.Component;
import org.swingclearance.identity.ClientAddress;
import org.swingclearance.identity.StaffAccountRepository;
import org.swingclearance.identity.StaffPrincipal;

/**
 * Turns Spring Security's events into audit rows: every sign-in, every failed sign-in (in the account's clinic
 * chain when the name is known, else the installation chain) and every access refused for a missing role.
 */
@Component
class SecurityEventAuditor {

    private final AuditLog audit;
    private final StaffAccountRepository accounts;

    SecurityEventAuditor(AuditLog audit, StaffAccountRepository accounts) {
        this.audit = audit;
        this.accounts = accounts;
    }

    @EventListener
    void onSuccess(AuthenticationSuccessEvent event) {
        if (event.getAuthentication().getPrincipal() instanceof StaffPrincipal principal) {
            audit.recordSession(principal.staff(), "SIGN_IN", AuditOutcome.SUCCESS,
                    ClientAddress.of(event.getAuthentication().getDetails()));
        }
    }

    @EventListener
    void onFailure(AbstractAuthenticationFailureEvent event) {
        Authentication attempt = event.getAuthentication();
        String name = attempt.getName();
        var clinicId = accounts.findByEmail(name == null ? "" : name.trim()).map(a -> a.getClinicId()).orElse(null);
        audit.recordAnonymous(clinicId, name, "SIGN_IN", AuditOutcome.FAILED, ClientAddress.of(attempt.getDetails()),
                event.getException().getClass().getSimpleName());
    }

    @EventListener
    void onDenied(AuthorizationDeniedEvent<?> event) {
        Authentication auth = event.getAuthentication().get();
        if (auth != null && auth.getPrincipal() instanceof StaffPrincipal principal) {
            audit.recordDenied(principal.staff(), "ACCESS_DENIED", "Request", null,
                    "missing role for a protected page or method");
        }
    }
}
