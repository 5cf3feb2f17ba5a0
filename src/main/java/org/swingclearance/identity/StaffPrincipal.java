package org.swingclearance.identity;

import java.util.Collection;
import java.util.List;
import org.springframework.security.core.CredentialsContainer;
import org.springframework.security.core.GrantedAuthority;
import org.springframework.security.core.authority.SimpleGrantedAuthority;
import org.springframework.security.core.userdetails.UserDetails;
import org.swingclearance.web.UnitPreference;

/** The signed-in staff member as Spring Security sees them; the password hash is erased after sign-in. */
public final class StaffPrincipal implements UserDetails, CredentialsContainer, UnitPreference {

    private final CurrentStaff staff;
    private final boolean enabled;
    private String passwordHash;

    StaffPrincipal(StaffAccount account) {
        this.staff = new CurrentStaff(account.getId(), account.getClinicId(), account.getRole(), account.getEmail(),
                account.getDisplayName(), account.getUnitSystem());
        this.enabled = account.isEnabled();
        this.passwordHash = account.getPasswordHash();
    }

    public CurrentStaff staff() {
        return staff;
    }

    @Override
    public Collection<? extends GrantedAuthority> getAuthorities() {
        return List.of(new SimpleGrantedAuthority(staff.role().authority()));
    }

    @Override
    public String getPassword() {
        return passwordHash;
    }

    @Override
    public String getUsername() {
        return staff.email();
    }

    @Override
    public boolean isEnabled() {
        return enabled;
    }

    @Override
    public boolean showsImperial() {
        return staff.unitSystem() == UnitSystem.IMPERIAL;
    }

    @Override
    public void eraseCredentials() {
        passwordHash = null;
    }
}
