package org.swingclearance.audit;

import java.time.Instant;
import java.util.Map;

/** A past verification as recorded in the trail: when, by whom, and what it found. */
public record VerificationSummary(Instant at, String by, boolean intact, String rows, String breakKind,
                                  String breakSeq, String explanation) {

    static VerificationSummary of(Instant at, String by, String detail) {
        Map<String, String> d = AuditDetail.parse(detail);
        return new VerificationSummary(at, by, "INTACT".equals(d.get("result")), d.get("rows"), d.get("break"),
                d.get("seq"), d.get("explanation"));
    }

    /** The detail recorded for a verification. */
    static String detailOf(VerificationReport report) {
        return AuditDetail.of("result", report.intact() ? "INTACT" : "BROKEN", "rows", report.rowsChecked(),
                "lastSeq", report.lastSeq(), "checkpoints", report.checkpointsChecked(),
                "break", report.intact() ? null : report.firstBreak().kind(),
                "seq", report.intact() ? null : report.firstBreak().seq(),
                "event", report.intact() ? null : report.firstBreak().eventId(),
                "explanation", report.intact() ? null : report.firstBreak().explanation(),
                "ms", report.took().toMillis());
    }
}
