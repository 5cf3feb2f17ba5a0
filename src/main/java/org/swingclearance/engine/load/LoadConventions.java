package org.swingclearance.engine.load;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citations;

/** The conventions load monitoring applies, in words, with the values of a policy filled in. */
public final class LoadConventions {

    private LoadConventions() {
    }

    /** Every convention in force under {@code policy}, in reading order; never null. */
    public static List<Convention> describe(MonitoringPolicy policy) {
        Objects.requireNonNull(policy, "policy");
        EwmaPolicy ewma = policy.ewma();
        return List.of(
                new Convention("load.session-rpe", "Session load = session RPE (CR-10, 0–10) × duration in minutes, "
                        + "in arbitrary units (AU); the duration includes warm-up and cool-down.",
                        Citations.FOSTER_2001),
                new Convention("load.rest-or-missing", "A day without a logged session counts as rest (0 AU); a day "
                        + "marked missing is not counted as 0.", Citations.EWMA_CONVENTIONS),
                new Convention("load.ewma", String.format(Locale.ROOT, "EWMA = λ × today's load + (1 − λ) × "
                        + "yesterday's EWMA, λ = 2/(N + 1): acute N = %d (λ = %.4f), chronic N = %d (λ = %.4f).",
                        ewma.acuteDays(), ewma.acuteLambda(), ewma.chronicDays(), ewma.chronicLambda()),
                        Citations.WILLIAMS_2017),
                new Convention("load.ewma-seed", "Both averages start at the first known day's load.",
                        Citations.EWMA_CONVENTIONS),
                new Convention("load.ewma-warm-up", "The EWMA ratio is not shown during the first "
                        + ewma.warmUpDays() + " days after the first known day.", Citations.EWMA_CONVENTIONS),
                new Convention("load.ewma-missing-day", "On a day marked missing both averages are carried over "
                        + "unchanged and no ratio is shown for that day.", Citations.EWMA_CONVENTIONS),
                new Convention("load.rolling", "Rolling ratios use the 28 days ending that day, all known: acute = "
                        + "the last 7-day total; coupled chronic = mean of the four 7-day totals including the acute "
                        + "week; uncoupled chronic = mean of the three weeks before it.", Citations.HULIN_2016),
                new Convention("load.rolling-uncoupled", "The uncoupled ratio leaves the acute week out of the "
                        + "chronic load to avoid mathematical coupling.", Citations.UNCOUPLED_ACWR),
                new Convention("load.monotony", "Monotony = mean ÷ " + (policy.sdConvention() == SdConvention.SAMPLE
                        ? "sample SD (n − 1)" : "population SD (n)") + " of the last 7 daily loads, rest days as 0; "
                        + "strain = weekly load × monotony; none when the SD is 0.", Citations.MONOTONY_SD_CONVENTION),
                new Convention("load.acwr-caution", String.format(Locale.ROOT, "An acute:chronic ratio above %.2f "
                        + "raises an alert.", policy.acwrCaution()), MonitoringPolicy.ACWR_CAUTION_SOURCE),
                new Convention("load.acwr-disputed", "The acute:chronic ratio is a monitoring signal whose predictive "
                        + "value is disputed, never a clearance.", Citations.IMPELLIZZERI_2021),
                new Convention("load.pain", String.format(Locale.ROOT, "Pain during a session at most %.0f/10, "
                        + "settled to baseline by the next morning, no week-on-week rise; otherwise go back a step. "
                        + "Progress after %d days on a step within these limits.", policy.pain().painDuringLimit(),
                        policy.pain().minDaysOnStep()), Citations.SILBERNAGEL_2007));
    }
}
