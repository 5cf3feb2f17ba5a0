package org.swingclearance.engine.load;

import java.util.Objects;
import org.swingclearance.engine.evidence.Citation;

/**
 * An alert for the clinician and a "go back to step N" message for the trainer.
 *
 * @param kind          never null
 * @param reason        the numbers behind it, in words; never blank
 * @param suggestedStep the plan step (numbered from 1) to go back to
 * @param source        where the rule comes from; never null
 */
public record Alert(Kind kind, String reason, int suggestedStep, Citation source) {

    /** Kinds of alert; a UI can key its message on these. */
    public enum Kind {
        PAIN_DURING_ABOVE_LIMIT,
        PAIN_NOT_SETTLED,
        PAIN_RISING_WEEKLY,
        /** The logged configuration had a higher demand than the current step. */
        CONFIGURATION_HEAVIER,
        /** The acute:chronic ratio is above the caution level: a monitoring signal, never a clearance. */
        ACWR_ABOVE_CAUTION
    }

    public Alert {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(source, "source");
        if (reason == null || reason.isBlank()) {
            throw new IllegalArgumentException("reason must not be blank");
        }
        if (suggestedStep < 1) {
            throw new IllegalArgumentException("steps are numbered from 1, was " + suggestedStep);
        }
    }
}
