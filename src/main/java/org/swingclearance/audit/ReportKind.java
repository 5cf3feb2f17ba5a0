package org.swingclearance.audit;

import java.util.Arrays;
import java.util.Optional;

/**
 * The manager's reports. Each is computed from audit events (actions in {@link AuditActions}), not from the
 * screening and plan tables, so it covers every record the trail saw, whatever those features store.
 */
public enum ReportKind {
    SCREENINGS_PER_CLINICIAN("screenings-per-clinician", true, false),
    BAND_OVERRIDES("band-overrides", true, false),
    OVERDUE_RESCREENS("overdue-rescreens", false, false),
    STALE_DRAFTS("stale-drafts", false, true),
    SHARES_PER_TRAINER("shares-per-trainer", true, false),
    ACTIVITY_PER_MONTH("activity-per-month", true, false);

    private final String slug;
    private final boolean usesDateRange;
    private final boolean usesDays;

    ReportKind(String slug, boolean usesDateRange, boolean usesDays) {
        this.slug = slug;
        this.usesDateRange = usesDateRange;
        this.usesDays = usesDays;
    }

    public String slug() {
        return slug;
    }

    public boolean usesDateRange() {
        return usesDateRange;
    }

    public boolean usesDays() {
        return usesDays;
    }

    public static Optional<ReportKind> ofSlug(String slug) {
        return Arrays.stream(values()).filter(k -> k.slug.equals(slug)).findFirst();
    }
}
