package org.swingclearance.engine.load;

import java.util.Objects;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Citations;

/**
 * The clinic-editable settings of load monitoring, stored with the practice rules.
 *
 * @param ewma         EWMA window lengths and warm-up; never null
 * @param sdConvention SD used by monotony; never null
 * @param acwrCaution  acute:chronic ratio above which an alert is raised, &gt; 0 (default 1.5, Gabbett 2016, contested)
 * @param pain         pain-monitoring limits; never null
 */
public record MonitoringPolicy(EwmaPolicy ewma, SdConvention sdConvention, double acwrCaution, PainPolicy pain) {

    /** Source of the default caution level. */
    public static final Citation ACWR_CAUTION_SOURCE = Citations.GABBETT_2016;

    /** N 7/28 with a 28-day warm-up, sample SD, caution above 1.5, pain limit 5/10 and a one-week hold. */
    public static final MonitoringPolicy DEFAULT = new MonitoringPolicy(EwmaPolicy.DEFAULT, SdConvention.SAMPLE, 1.5,
            PainPolicy.DEFAULT);

    public MonitoringPolicy {
        Objects.requireNonNull(ewma, "ewma");
        Objects.requireNonNull(sdConvention, "sdConvention");
        Objects.requireNonNull(pain, "pain");
        if (!Double.isFinite(acwrCaution) || acwrCaution <= 0) {
            throw new IllegalArgumentException("ACWR caution level must be > 0, was " + acwrCaution);
        }
    }
}
