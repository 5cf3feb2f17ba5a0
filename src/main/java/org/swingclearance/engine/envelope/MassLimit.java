package org.swingclearance.engine.envelope;

import org.swingclearance.engine.mechanics.Verdict;

/**
 * The heaviest club of the same shape (balance point and radius of gyration fixed) in
 * (0, {@value EnvelopeCalculator#MAX_CLUB_MASS_KG}] kg that is permitted at the chosen grip mark and cycle time.
 *
 * @param status  OK or NOT_PERMISSIBLE
 * @param massKg  the limit, kg; null when not permissible
 * @param verdict the verdict at the limit, or, when not permissible, at the lightest mass searched; never null
 */
public record MassLimit(LimitStatus status, Double massKg, Verdict verdict) {
}
