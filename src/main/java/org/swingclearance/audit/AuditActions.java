package org.swingclearance.audit;

/**
 * The action names the manager's reports read from the audit trail, with the detail keys each must carry
 * ({@link AuditDetail#of}). The reports are built on these events, not on the screening and plan tables, so
 * they keep working whatever those features store. Features record them with {@link AuditLog#record}.
 */
public final class AuditActions {

    /** A draft screening was started: object Screening/id, patient, detail {@code episode}. */
    public static final String SCREENING_CREATE = "SCREENING_CREATE";
    /** A screening version was signed: object Screening/id, patient, detail {@code episode}, {@code version}. */
    public static final String SCREENING_SIGN = "SCREENING_SIGN";
    /**
     * A signed screening was reopened as a new draft version for a correction: object Screening/id, patient,
     * detail {@code version}. Until a later SCREENING_SIGN the draft counts as open.
     */
    public static final String SCREENING_AMEND = "SCREENING_AMEND";
    /** A draft screening was discarded unsigned: object Screening/id, patient. */
    public static final String SCREENING_DISCARD = "SCREENING_DISCARD";
    /**
     * A proposed load band was overridden before signing: object Screening/id, patient, detail {@code region}
     * (SHOULDER or LUMBOPELVIC) and {@code reason} (the clinician's words).
     */
    public static final String BAND_OVERRIDE = "BAND_OVERRIDE";
    /**
     * A graded plan was issued: object Plan/id, patient, detail {@code episode} and {@code rescreenDue}
     * (ISO date of the plan's next re-screen gate, left out when the plan has none).
     */
    public static final String PLAN_ISSUE = "PLAN_ISSUE";
    /** A plan was shared with a trainer: object Plan/id, patient, detail {@code trainer} (staff id). */
    public static final String PLAN_SHARE = "PLAN_SHARE";
    /** A share was withdrawn: object Plan/id, patient, detail {@code trainer} (staff id). */
    public static final String PLAN_UNSHARE = "PLAN_UNSHARE";

    /** The manager's own work on the trail, audited like any other access (EHR-S FM TI.2.2#04). */
    public static final String AUDIT_VIEW = "AUDIT_VIEW";
    public static final String AUDIT_EXPORT = "AUDIT_EXPORT";
    public static final String AUDIT_VERIFY = "AUDIT_VERIFY";
    public static final String AUDIT_CHECKPOINT = "AUDIT_CHECKPOINT";
    public static final String RETENTION_UPDATE = "RETENTION_UPDATE";

    private AuditActions() {
    }
}
