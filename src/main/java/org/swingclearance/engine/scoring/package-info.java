/**
 * Screening scores and derived values as pure functions: limb symmetry, rotation deficits, strength conversions,
 * the closed-kinetic-chain and reach tests, trunk endurance ratios, lumbopelvic tests, questionnaire scores
 * (by item index only, never item wording) and change against the minimal clinically important difference.
 *
 * <p>Null policy: a {@code null} input means "not tested" and yields a {@link org.swingclearance.engine.scoring.Score}
 * that is not scorable and names the rule that made it so, never a number. A value outside its physical range (a
 * negative time, a questionnaire response off its scale, a lever arm of 0) is a caller error and throws
 * {@link java.lang.IllegalArgumentException}: the web layer refuses such input before it reaches the engine, using the
 * ranges published by {@link org.swingclearance.engine.scoring.Measure}.
 */
package org.swingclearance.engine.scoring;
