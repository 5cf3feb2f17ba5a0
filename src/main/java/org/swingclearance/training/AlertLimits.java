package org.swingclearance.training;

/**
 * The clinic's practice-rule values the alerts use, with the rule-set version they came from: the highest
 * acceptable pain during a session (0–10) and the acute:chronic ratio above which the clinician is told.
 */
public record AlertLimits(int rulesVersion, int painDuringLimit, double ratioCaution) {
}
