package org.swingclearance.audit;

import org.springframework.boot.context.properties.ConfigurationProperties;

/**
 * Configuration of the audit trail ({@code clearance.audit.*}).
 *
 * @param checkpointKey secret for the checkpoints' HMAC-SHA256; the shipped default is for development only and
 *                      every installation must set its own (environment variable CLEARANCE_AUDIT_CHECKPOINT_KEY)
 * @param checkpointCron when the daily checkpoint job runs (UTC); "-" switches it off
 * @param pageSize rows per page of the audit browser
 */
@ConfigurationProperties(prefix = "clearance.audit")
public record AuditSettings(String checkpointKey, String checkpointCron, Integer pageSize) {

    /** The development default shipped in application.properties; the overview page warns while it is in use. */
    public static final String DEVELOPMENT_KEY = "development-only-audit-checkpoint-key";

    public AuditSettings {
        if (checkpointKey == null || checkpointKey.isBlank()) {
            checkpointKey = DEVELOPMENT_KEY;
        }
        if (checkpointCron == null || checkpointCron.isBlank()) {
            checkpointCron = "0 5 0 * * *";
        }
        if (pageSize == null || pageSize < 1) {
            pageSize = 50;
        }
    }

    public boolean usesDevelopmentKey() {
        return DEVELOPMENT_KEY.equals(checkpointKey);
    }
}
