package org.swingclearance.identity;

/** What a staff account may do; each account has exactly one role. */
public enum StaffRole {
    CLINICIAN, TRAINER, MANAGER, ADMIN;

    /** The Spring Security authority name for this role. */
    public String authority() {
        return "ROLE_" + name();
    }
}
