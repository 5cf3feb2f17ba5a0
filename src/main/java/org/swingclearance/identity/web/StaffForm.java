package org.swingclearance.identity.web;

import jakarta.validation.constraints.Email;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.identity.StaffView;

/** The administrator's form for one staff account; the password is only asked for on creation or reset. */
public class StaffForm {

    @NotBlank
    @Email
    @Size(max = 254)
    private String email;
    @NotBlank
    @Size(max = 200)
    private String displayName;
    @NotNull
    private StaffRole role;
    private boolean enabled = true;
    private String password;
    private long version;

    static StaffForm from(StaffView v) {
        StaffForm f = new StaffForm();
        f.email = v.email();
        f.displayName = v.displayName();
        f.role = v.role();
        f.enabled = v.enabled();
        f.version = v.version();
        return f;
    }

    public String getEmail() { return email; }
    public void setEmail(String email) { this.email = email; }
    public String getDisplayName() { return displayName; }
    public void setDisplayName(String displayName) { this.displayName = displayName; }
    public StaffRole getRole() { return role; }
    public void setRole(StaffRole role) { this.role = role; }
    public boolean isEnabled() { return enabled; }
    public void setEnabled(boolean enabled) { this.enabled = enabled; }
    public String getPassword() { return password; }
    public void setPassword(String password) { this.password = password; }
    public long getVersion() { return version; }
    public void setVersion(long version) { this.version = version; }
}
