package org.swingclearance.engine.rules;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.swingclearance.engine.scoring.MeasureKey;
import org.swingclearance.engine.scoring.NotScorable;
import org.swingclearance.engine.scoring.ValueKey;

/**
 * A value a rule needed that the screening does not have.
 *
 * @param rule     the rule; never null
 * @param key      the missing value; never null
 * @param need     why it matters; never null
 * @param measures the unrecorded measurement slots behind it (empty when not known, or when the slots are recorded
 *                 but the value is still not scorable); never null
 * @param why      why the value is not scorable, when known
 */
public record MissingValue(Rule rule, ValueKey key, Need need, List<MeasureKey> measures, Optional<NotScorable> why) {

    /** Why a missing value matters. */
    public enum Need {
        /** The rule is required: signing is refused until the value is present. */
        REQUIRED,
        /** A fired rule needs the value to be interpreted: signing is refused until it is present. */
        NEEDED_BY_FIRED_RULE,
        /** The rule could not be checked; signing is allowed, the gap is shown. */
        NOT_EVALUATED
    }

    public MissingValue {
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(need, "need");
        measures = List.copyOf(Objects.requireNonNull(measures, "measures"));
        Objects.requireNonNull(why, "why");
    }

    /** True when this gap blocks signing. */
    public boolean blocksSigning() {
        return need != Need.NOT_EVALUATED;
    }
}
