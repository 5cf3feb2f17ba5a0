package org.swingclearance.plan;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import org.springframework.stereotype.Component;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.equipment.SwingPatternView;
import org.swingclearance.equipment.SwingPatterns;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.EpisodeStatus;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.PatientSummary;
import org.swingclearance.patient.Patients;
import org.swingclearance.patient.Region;
import org.swingclearance.rules.BandPlanDefaults;
import org.swingclearance.rules.CurrentRuleSet;
import org.swingclearance.rules.PracticeRules;
import org.swingclearance.screening.Screenings;
import org.swingclearance.screening.SignedScreeningFacts;
import org.swingclearance.web.InvalidStateException;

/**
 * Gathers what a plan is computed from: the episode's latest signed screening (Contract S), the clinic's current
 * practice rules (Contract R), its clubs in service and the chosen swing pattern (Contract E), and the patient's
 * body. Says why no plan can be made (hold, no signed screening, band Hold, no torque measured, no clubs) with a
 * message key, rather than computing something unsafe.
 *
 * <p>The band the plan may use is the lower of the bands of the regions the episode involves: a shoulder episode
 * uses the shoulder band, a lumbopelvic one the lumbopelvic band, one with both regions the lower of the two.
 */
@Component
class PlanInputsAssembler {

    private final Screenings screenings;
    private final PracticeRules practiceRules;
    private final Clubs clubs;
    private final SwingPatterns patterns;
    private final Patients patients;

    PlanInputsAssembler(Screenings screenings, PracticeRules practiceRules, Clubs clubs, SwingPatterns patterns,
                        Patients patients) {
        this.screenings = screenings;
        this.practiceRules = practiceRules;
        this.clubs = clubs;
        this.patterns = patterns;
        this.patients = patients;
    }

    /** Why no plan can be made for the episode now, as a message key; empty when one can. */
    Optional<String> blocker(CurrentStaff staff, EpisodeSummary episode) {
        if (episode.onHold()) {
            return Optional.of("plan.blocked.onHold");
        }
        if (episode.status() == EpisodeStatus.CLOSED) {
            return Optional.of("plan.blocked.episodeClosed");
        }
        Optional<SignedScreeningFacts> facts = screenings.latestSigned(staff, episode.id());
        if (facts.isEmpty()) {
            return Optional.of("plan.blocked.noScreening");
        }
        if (facts.get().redFlagsOpen()) {
            return Optional.of("plan.blocked.redFlagsInScreening");
        }
        if (PlanBands.HOLD.equals(band(episode, facts.get()))) {
            return Optional.of("plan.blocked.bandHold");
        }
        if (facts.get().shoulderFlexionTorqueInvolvedNm() == null && facts.get().shoulderFlexionTorqueWeakerNm() == null) {
            return Optional.of("plan.blocked.noTorque");
        }
        if (clubs.active(staff).isEmpty()) {
            return Optional.of("plan.blocked.noClubs");
        }
        if (patterns.all(staff).isEmpty()) {
            return Optional.of("plan.blocked.noPatterns");
        }
        return Optional.empty();
    }

    /** The latest signed screening's id, if any (to tell whether a draft still rests on it). */
    Optional<UUID> latestScreening(CurrentStaff staff, UUID episodeId) {
        return screenings.latestSigned(staff, episodeId).map(SignedScreeningFacts::screeningId);
    }

    Optional<Integer> latestScreeningVersion(CurrentStaff staff, UUID episodeId) {
        return screenings.latestSigned(staff, episodeId).map(SignedScreeningFacts::version);
    }

    /** The sources for a plan of the episode with the pattern; refuses with the blocker's message key. */
    PlanSources assemble(CurrentStaff staff, EpisodeSummary episode, UUID patternId) {
        blocker(staff, episode).ifPresent(key -> {
            throw new InvalidStateException(key);
        });
        SignedScreeningFacts facts = screenings.latestSigned(staff, episode.id()).orElseThrow();
        SwingPatternView pattern = patterns.find(staff, patternId)
                .orElseThrow(() -> new PlanSettingsRejected("patternId", "plan.settings.error.pattern"));
        Double torque = pattern.hands() == 1 ? facts.shoulderFlexionTorqueInvolvedNm()
                : facts.shoulderFlexionTorqueWeakerNm();
        if (torque == null) {
            throw new InvalidStateException("plan.blocked.noTorque");
        }
        Double grip = pattern.hands() == 1 ? facts.gripStrengthInvolvedKg() : facts.gripStrengthWeakerKg();
        CurrentRuleSet rules = practiceRules.current(staff.clinicId());
        PatientSummary patient = patients.find(staff, episode.patientId()).orElseThrow();
        String band = band(episode, facts);
        String next = PlanBands.next(band).orElse(null);
        List<PlanningInputs.ClubInput> inventory = clubs.active(staff).stream().map(PlanInputsAssembler::club)
                .toList();
        PlanningInputs inputs = new PlanningInputs(patient.statureM(), patient.bodyMassKg(),
                facts.shoulderToGripMeasuredM(), torque, grip, facts.activeFlexionInvolvedDeg(),
                facts.lumbopelvicBand(), band, bandFraction(episode, facts, band), next,
                next == null ? null : rules.fraction(next),
                Double.isNaN(rules.gripFraction()) ? null : rules.gripFraction(), rules.controlledStop(),
                rules.rangeMarginDeg(), rules.hipDrivenMinimumBand(),
                new PlanningInputs.PatternInput(pattern.id(), pattern.name(), pattern.centreDeg(),
                        pattern.halfArcDeg(), pattern.hands(), pattern.reach(), pattern.kind(), pattern.hipDriven(),
                        pattern.minimumLumbopelvicBand()),
                inventory, PlanComputation.ladder());
        return new PlanSources(facts.screeningId(), facts.version(), facts.signedAt(), rules.version(),
                rules.stepLimit(), rules.painDuringLimit(), defaultDoses(rules), inputs);
    }

    /** The clinic's default sets × reps and effort cap per plannable band. */
    Map<String, Dose> defaultDoses(CurrentStaff staff) {
        return defaultDoses(practiceRules.current(staff.clinicId()));
    }

    private static Map<String, Dose> defaultDoses(CurrentRuleSet rules) {
        Map<String, Dose> doses = new LinkedHashMap<>();
        for (String band : PlanBands.PLANNABLE) {
            BandPlanDefaults d = rules.planDefaults(org.swingclearance.engine.rules.LoadBand.valueOf(band));
            doses.put(band, new Dose(d.sets(), d.reps(), d.effortCap()));
        }
        return doses;
    }

    private static String band(EpisodeSummary episode, SignedScreeningFacts facts) {
        if (episode.region() == Region.SHOULDER) {
            return facts.shoulderBand();
        }
        if (episode.region() == Region.LUMBOPELVIC) {
            return facts.lumbopelvicBand();
        }
        return PlanBands.lower(facts.shoulderBand(), facts.lumbopelvicBand());
    }

    private static double bandFraction(EpisodeSummary episode, SignedScreeningFacts facts, String band) {
        boolean shoulder = episode.region() == Region.SHOULDER
                || episode.region() == Region.BOTH && band.equals(facts.shoulderBand());
        return shoulder ? facts.shoulderBandFraction() : facts.lumbopelvicBandFraction();
    }

    private static PlanningInputs.ClubInput club(ClubView c) {
        return new PlanningInputs.ClubInput(c.id(), c.name(), c.massKg(), c.lengthM(), c.balancePointM(),
                c.handleLengthM(), c.headCentreM(), c.inertiaAboutBalancePointKgM2(), c.inertiaSource());
    }
}
