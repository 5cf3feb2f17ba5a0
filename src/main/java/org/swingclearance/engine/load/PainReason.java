package org.swingclearance.engine.load;

import java.util.Objects;

/**
 * One reason behind a pain-monitoring decision.
 *
 * @param kind   never null
 * @param detail the numbers behind it, in words, e.g. "pain during 6/10 on 2025-03-04 above the limit 5/10";
 *               never blank
 */
public record PainReason(Kind kind, String detail) {

    /** Kinds of reason; a UI can key its message on these. */
    public enum Kind {
        /** Pain during the latest session above the limit: regress. */
        PAIN_DURING_ABOVE_LIMIT(true),
        /** Next-morning pain above the baseline: regress. */
        NOT_SETTLED_NEXT_MORNING(true),
        /** Weekly mean pain rose from the week before: regress. */
        WEEKLY_RISE(true),
        /** No session logged yet: hold. */
        NO_SESSION(false),
        /** The latest session's next-morning pain is not entered yet: hold. */
        NEXT_MORNING_NOT_RECORDED(false),
        /** No baseline pain to judge "settled" against: hold. */
        NO_BASELINE(false),
        /** The step has not been held long enough: hold. */
        STEP_HELD_TOO_SHORT(false),
        /** A session within the hold period exceeded the limits: hold until a symptom-stable period has passed. */
        RECENT_SYMPTOMS(false),
        /** No sessions in the previous week to compare with; informs only. */
        TREND_NOT_ASSESSABLE(false),
        /** Every criterion met. */
        WITHIN_LIMITS(false);

        private final boolean regress;

        Kind(boolean regress) {
            this.regress = regress;
        }

        /** True when this reason alone calls for regression. */
        public boolean regress() {
            return regress;
        }
    }

    public PainReason {
        Objects.requireNonNull(kind, "kind");
        if (detail == null || detail.isBlank()) {
            throw new IllegalArgumentException("detail must not be blank");
        }
    }
}
