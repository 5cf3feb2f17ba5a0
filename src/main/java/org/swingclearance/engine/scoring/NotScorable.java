package org.swingclearance.engine.scoring;

import java.util.Objects;

/**
 * Why a score was not computed.
 *
 * @param reason the kind of gap; never null
 * @param rule   the rule that made it so, in words, e.g. "QuickDASH needs at least 10 of 11 items answered; 9
 *               answered"; never blank
 */
public record NotScorable(Reason reason, String rule) {

    /** Kinds of gap; a UI can key its message on these. */
    public enum Reason {
        /** An input was not tested (null). */
        NOT_TESTED,
        /** A questionnaire has fewer answered items than its missing-item rule allows. */
        INCOMPLETE,
        /** The formula is undefined for these inputs (a zero denominator). */
        UNDEFINED,
        /** A side-to-side comparison needs the involved side, which was not given. */
        NO_INVOLVED_SIDE
    }

    public NotScorable {
        Objects.requireNonNull(reason, "reason");
        if (rule == null || rule.isBlank()) {
            throw new IllegalArgumentException("rule must not be blank");
        }
    }
}
