package org.swingclearance.patient;

import java.util.UUID;
import org.swingclearance.identity.CurrentStaff;

/**
 * Published inside the transaction that withdraws a patient's consent to share, so the plan feature ends the shares
 * that rested on it in the same transaction (and audits each as an unshare).
 */
public record ConsentWithdrawn(CurrentStaff by, UUID patientId, UUID consentId) {
}
