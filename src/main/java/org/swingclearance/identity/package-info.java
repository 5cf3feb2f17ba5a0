/**
 * Clinics (tenants), staff accounts and roles, sign-in with throttling, and the security configuration.
 * Other features ask {@link org.swingclearance.identity.CurrentStaff} who is acting and for which clinic.
 */
package org.swingclearance.identity;
