package org.swingclearance.engine.rules;

import java.util.Objects;
import org.swingclearance.engine.evidence.Citation;

/**
 * A rule that fired on a screening.
 *
 * @param rule       the rule; never null
 * @param value      the value that made it fire, in the rule's unit
 * @param threshold  the rule's threshold
 * @param source     source of the threshold; never null
 * @param cappedBand the band the rule caps its region at; never null
 */
public record Finding(Rule rule, double value, double threshold, Citation source, LoadBand cappedBand) {

    public Finding {
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(cappedBand, "cappedBand");
    }

    static Finding of(Rule rule, double value) {
        return new Finding(rule, value, rule.threshold(), rule.source(), rule.caps());
    }
}
