package org.swingclearance.screening;

import java.time.LocalDate;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.PatientSummary;
import org.swingclearance.rules.CurrentRuleSet;

/**
 * Everything besides the measurements that a screening's evaluation depends on.
 *
 * @param patient  body mass, stature, age, sex, dominant hand
 * @param episode  region(s) and involved shoulder
 * @param on       the day of the screening (for the patient's age)
 * @param rules    the practice-rules version to band with
 * @param previous the previous signed screening of the episode, null when there is none
 */
record EvaluationContext(PatientSummary patient, EpisodeSummary episode, LocalDate on, CurrentRuleSet rules,
                         PreviousSigned previous) {

    /** A previous signed screening and its snapshot. */
    record PreviousSigned(java.util.UUID screeningId, int versionNo, java.time.Instant signedAt,
                          ScreeningSnapshot snapshot) {
    }
}
