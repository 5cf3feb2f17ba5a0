package org.swingclearance.plan;

import java.util.List;
import java.util.UUID;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.SwingPatternView;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.PatientSummary;

/**
 * Everything the clinician's plan page of an episode shows: why no plan can be made (if so), the draft and the
 * current issued version, the version history, shares, trainers and invitations, and what the settings form offers.
 *
 * @param blockedKey message key saying why no plan can be generated now; null when one can
 * @param defaults   settings a new plan starts from (practice-rule doses, today, no target)
 */
public record PlanPage(EpisodeSummary episode, PatientSummary patient, String blockedKey, UUID planId,
                       PlanVersionView draft, PlanVersionView issued, List<PlanVersionView> history,
                       List<ShareView> shares, List<TrainerOption> trainers, List<InvitationView> invitations,
                       PlanSettings defaults, List<SwingPatternView> patterns, List<ClubView> clubs,
                       List<Double> cycleLadderS) {

    public PlanPage {
        history = List.copyOf(history);
        shares = List.copyOf(shares);
        trainers = List.copyOf(trainers);
        invitations = List.copyOf(invitations);
        patterns = List.copyOf(patterns);
        clubs = List.copyOf(clubs);
        cycleLadderS = List.copyOf(cycleLadderS);
    }

    public boolean hasPlan() {
        return planId != null;
    }

    /** The ways a step length can be counted, for the settings form. */
    public List<StepUnit> stepUnits() {
        return List.of(StepUnit.values());
    }

    /** The version the page shows in full: the draft while one is open, else the current issued version. */
    public PlanVersionView shown() {
        return draft != null ? draft : issued;
    }
}
