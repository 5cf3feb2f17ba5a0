package org.swingclearance.engine.scoring;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.swingclearance.engine.evidence.Citation;

/**
 * One computed value with its unit and the source of its formula — or, when it cannot be computed, the rule that
 * prevents it. Exactly one of {@link #value()} and {@link #notScorable()} is present. Values are raw doubles; round
 * only for display.
 *
 * @param value       the value when scorable, finite; empty otherwise
 * @param unit        unit of the value; never null
 * @param citation    source of the formula; never null
 * @param notScorable why there is no value; empty when scorable
 */
public record Score(OptionalDouble value, Unit unit, Citation citation, Optional<NotScorable> notScorable) {

    public Score {
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(citation, "citation");
        Objects.requireNonNull(notScorable, "notScorable");
        if (value.isPresent() == notScorable.isPresent()) {
            throw new IllegalArgumentException("exactly one of value and notScorable must be present");
        }
        if (value.isPresent() && !Double.isFinite(value.getAsDouble())) {
            throw new IllegalArgumentException("value must be finite: " + value.getAsDouble());
        }
    }

    /** A computed value; {@code value} must be finite. */
    public static Score of(double value, Unit unit, Citation citation) {
        return new Score(OptionalDouble.of(value), unit, citation, Optional.empty());
    }

    /** A yes/no result coded 1 or 0 in {@link Unit#YES_NO}. */
    public static Score yesNo(boolean yes, Citation citation) {
        return of(yes ? 1 : 0, Unit.YES_NO, citation);
    }

    /** No value, for the given reason and rule. */
    public static Score notScorable(Unit unit, Citation citation, NotScorable.Reason reason, String rule) {
        return new Score(OptionalDouble.empty(), unit, citation, Optional.of(new NotScorable(reason, rule)));
    }

    /** No value because an input was not tested; {@code rule} says which. */
    public static Score notTested(Unit unit, Citation citation, String rule) {
        return notScorable(unit, citation, NotScorable.Reason.NOT_TESTED, rule);
    }

    /** True when a value is present. */
    public boolean scorable() {
        return value.isPresent();
    }

    /** The value; throws {@link java.util.NoSuchElementException} when not scorable. */
    public double orElseThrow() {
        return value.orElseThrow();
    }

    /** True when this is a {@link Unit#YES_NO} value coded 1. */
    public boolean isYes() {
        return unit == Unit.YES_NO && value.isPresent() && value.getAsDouble() == 1;
    }
}
