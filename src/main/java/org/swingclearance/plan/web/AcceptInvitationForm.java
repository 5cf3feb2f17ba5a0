package org.swingclearance.plan.web;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Size;

/** What the invited trainer sets: their name and a password (checked against the password policy). */
public class AcceptInvitationForm {

    @NotBlank
    @Size(max = 200)
    private String displayName;
    @NotBlank
    @Size(max = 512)
    private String password;

    public String getDisplayName() { return displayName; }
    public void setDisplayName(String displayName) { this.displayName = displayName; }
    public String getPassword() { return password; }
    public void setPassword(String password) { this.password = password; }
}
