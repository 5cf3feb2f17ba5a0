package org.swingclearance.patient;

import java.util.List;

/** Everything the patient page shows from this feature. */
public record PatientPage(PatientSummary patient, List<EpisodeSummary> episodes, List<ConsentView> consents,
                          List<ReferralView> referrals) {
}
