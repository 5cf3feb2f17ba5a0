package org.swingclearance.engine.load;

import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Citations;

/**
 * What the pain-monitoring rule says about the next session.
 *
 * @param decision never null
 * @param reasons  every reason found, regress reasons first; never empty
 * @param sources  the rule's sources; never null
 */
public record PainDecision(Decision decision, List<PainReason> reasons, List<Citation> sources) {

    /** Sources of the rule: Silbernagel's model and the one-week hold rule of thumb. */
    public static final List<Citation> SOURCES = List.of(Citations.SILBERNAGEL_2007, Citations.HOLD_UNTIL_STABLE);

    /** The recommendation. */
    public enum Decision {
        /** Criteria met for a week on this step: the next step may follow. */
        PROGRESS,
        /** Stay on the current step. */
        HOLD,
        /** Go back to the previous step. */
        REGRESS
    }

    public PainDecision {
        Objects.requireNonNull(decision, "decision");
        reasons = List.copyOf(Objects.requireNonNull(reasons, "reasons"));
        sources = List.copyOf(Objects.requireNonNull(sources, "sources"));
        if (reasons.isEmpty()) {
            throw new IllegalArgumentException("a decision has at least one reason");
        }
    }

    /** True when a reason of this kind is present. */
    public boolean has(PainReason.Kind kind) {
        return reasons.stream().anyMatch(reason -> reason.kind() == kind);
    }
}
