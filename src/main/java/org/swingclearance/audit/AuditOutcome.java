package org.swingclearance.audit;

/** How an audited attempt ended. */
public enum AuditOutcome {
    SUCCESS, DENIED, FAILED
}
