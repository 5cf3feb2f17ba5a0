package org.swingclearance.audit.web;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import org.springframework.stereotype.Component;

/** Formats times for the audit pages as {@code ${@auditTimes.utc(t)}}: always UTC (EHR-S FM TI.2.3#03). */
@Component("auditTimes")
public class AuditTimes {

    private static final DateTimeFormatter UTC = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("yyyy-MM-dd").withZone(ZoneOffset.UTC);

    public String utc(Instant at) {
        return at == null ? "–" : UTC.format(at);
    }

    public String day(Instant at) {
        return at == null ? "–" : DAY.format(at);
    }

    /** The first characters of a long hash, enough to tell rows apart on a page. */
    public String shortHash(String hex) {
        return hex == null ? "–" : hex.substring(0, Math.min(16, hex.length())) + "…";
    }
}
