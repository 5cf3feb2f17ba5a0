package org.swingclearance.envelope;

import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.springframework.context.MessageSource;
import org.springframework.context.i18n.LocaleContextHolder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.engine.envelope.EnvelopeCalculator;
import org.swingclearance.engine.mechanics.Body;
import org.swingclearance.engine.mechanics.EngineVersion;
import org.swingclearance.equipment.ClubView;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.equipment.SwingPatternView;
import org.swingclearance.equipment.SwingPatterns;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.PatientSummary;
import org.swingclearance.patient.Patients;
import org.swingclearance.rules.CurrentRuleSet;
import org.swingclearance.rules.PracticeRules;
import org.swingclearance.screening.Screenings;
import org.swingclearance.screening.SignedScreeningFacts;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * The envelope's application service (Contract E). Gathers the inputs (latest signed screening, the practice
 * rules it was signed under, the patient's body, the clinic's clubs in service and swing patterns), reuses the
 * stored snapshot computed from exactly those inputs or computes and stores a new one, and answers the what-if
 * panel. Scoped to the caller's clinic; another clinic's episode, club or pattern is a 404 (audited).
 */
@Service
public class Envelopes {

    /** The usual cycle time when the clinician has not given one, s. */
    public static final double DEFAULT_CYCLE_TIME_S = 2.0;

    private final Screenings screenings;
    private final PracticeRules practiceRules;
    private final Patients patients;
    private final Clubs clubs;
    private final SwingPatterns patterns;
    private final EnvelopeSnapshots snapshots;
    private final AuditLog audit;
    private final MessageSource messages;
    private final Clock clock;

    Envelopes(Screenings screenings, PracticeRules practiceRules, Patients patients, Clubs clubs,
              SwingPatterns patterns, EnvelopeSnapshots snapshots, AuditLog audit, MessageSource messages,
              Clock clock) {
        this.screenings = screenings;
        this.practiceRules = practiceRules;
        this.patients = patients;
        this.clubs = clubs;
        this.patterns = patterns;
        this.snapshots = snapshots;
        this.audit = audit;
        this.messages = messages;
        this.clock = clock;
    }

    /**
     * The envelope of the episode's latest signed screening at the patient's usual cycle time (the last one used
     * for that screening, else {@value #DEFAULT_CYCLE_TIME_S} s), computed and stored if the inputs changed; empty
     * when the episode is not the caller's clinic's or no envelope can be computed. Does not audit the read (the
     * caller audits its own); a newly stored snapshot is audited as ENVELOPE_COMPUTE.
     */
    @Transactional
    public Optional<EnvelopeSnapshotView> latest(CurrentStaff staff, UUID episodeId) {
        return patients.findEpisode(staff, episodeId)
                .map(episode -> prepare(staff, episode, null))
                .filter(prepared -> prepared.blocks().isEmpty())
                .map(prepared -> ensure(staff, prepared));
    }

    /** The envelope page, audited as ENVELOPE_READ of the patient's record. */
    @Transactional
    public EnvelopePage page(CurrentStaff staff, UUID episodeId, Double cycleTimeS) {
        EpisodeSummary episode = loadEpisode(staff, episodeId, "ENVELOPE_READ");
        PatientSummary patient = patients.find(staff, episode.patientId()).orElseThrow();
        audit.record(staff, "ENVELOPE_READ", "Episode", episodeId, episode.patientId(), null);
        Prepared prepared = prepare(staff, episode, cycleTimeS);
        if (!prepared.blocks().isEmpty()) {
            return new EnvelopePage(patient, episode, prepared.blocks(), prepared.facts() != null, null, List.of(),
                    List.of());
        }
        EnvelopeSnapshotView snapshot = ensure(staff, prepared);
        return new EnvelopePage(patient, episode, List.of(), true, snapshot, prepared.inputs().clubs(),
                prepared.inputs().patterns());
    }

    /**
     * One configuration tried on the page, computed by the engine from the same inputs as the envelope; audited
     * as ENVELOPE_WHATIF.
     *
     * @throws InvalidStateException when no envelope can be computed for the episode
     */
    @Transactional
    public WhatIf whatIf(CurrentStaff staff, UUID episodeId, UUID clubId, UUID patternId, double gripMarkCm,
                         double cycleTimeS) {
        EpisodeSummary episode = loadEpisode(staff, episodeId, "ENVELOPE_WHATIF");
        Prepared prepared = prepare(staff, episode, cycleTimeS);
        if (!prepared.blocks().isEmpty()) {
            throw new InvalidStateException("envelope.whatIf.unavailable");
        }
        ClubView club = clubs.find(staff, clubId).orElseThrow(() -> denied(staff, "ENVELOPE_WHATIF", "Club", clubId));
        SwingPatternView pattern = patterns.find(staff, patternId)
                .orElseThrow(() -> denied(staff, "ENVELOPE_WHATIF", "SwingPattern", patternId));
        audit.record(staff, "ENVELOPE_WHATIF", "Episode", episodeId, episode.patientId(), null);
        WhatIf result = EnvelopeComputation.whatIf(prepared.inputs(), club, pattern, gripMarkCm / 100.0,
                cycleTimeS);
        return result.labelled(result.binding() == null ? null : text("envelope.constraint." + result.binding()),
                text(verdictKey(result)));
    }

    /**
     * A configuration tried on a page already read (and audited): computed from the page's snapshot inputs, no
     * database access. Falls back to the first club and pattern when the ids are not part of the page.
     */
    public WhatIf tryOn(EnvelopePage page, UUID clubId, UUID patternId, Double gripMarkCm, Double cycleTimeS) {
        EnvelopeInputs inputs = page.snapshot().inputs();
        ClubView club = inputs.clubs().stream().filter(c -> c.id().equals(clubId)).findFirst()
                .orElse(inputs.clubs().get(0));
        SwingPatternView pattern = inputs.patterns().stream().filter(p -> p.id().equals(patternId)).findFirst()
                .orElse(inputs.patterns().get(0));
        EnvelopeRow row = page.snapshot().row(club.id(), pattern.id()).orElseThrow();
        double grip = gripMarkCm != null ? gripMarkCm
                : row.furthestGripCm() != null ? row.furthestGripCm() : row.usualGripCm();
        double time = cycleTimeS != null ? cycleTimeS : inputs.cycleTimeS();
        WhatIf result = EnvelopeComputation.whatIf(inputs, club, pattern, grip / 100.0, time);
        return result.labelled(result.binding() == null ? null : text("envelope.constraint." + result.binding()),
                text(verdictKey(result)));
    }

    /** The snapshot for an export of the page, audited as ENVELOPE_EXPORT; empty when blocked. */
    @Transactional
    public Optional<EnvelopePage> export(CurrentStaff staff, UUID episodeId, Double cycleTimeS) {
        EpisodeSummary episode = loadEpisode(staff, episodeId, "ENVELOPE_EXPORT");
        PatientSummary patient = patients.find(staff, episode.patientId()).orElseThrow();
        Prepared prepared = prepare(staff, episode, cycleTimeS);
        if (!prepared.blocks().isEmpty()) {
            return Optional.empty();
        }
        EnvelopeSnapshotView snapshot = ensure(staff, prepared);
        audit.record(staff, "ENVELOPE_EXPORT", "EnvelopeSnapshot", snapshot.id(), episode.patientId(), null);
        return Optional.of(new EnvelopePage(patient, episode, List.of(), true, snapshot, prepared.inputs().clubs(),
                prepared.inputs().patterns()));
    }

    /** Inputs, or the reasons there can be none; {@code facts} is null without a signed screening. */
    private record Prepared(EpisodeSummary episode, SignedScreeningFacts facts, List<EnvelopeBlock> blocks,
                            EnvelopeInputs inputs) {
    }

    private Prepared prepare(CurrentStaff staff, EpisodeSummary episode, Double requestedCycleTimeS) {
        Optional<SignedScreeningFacts> signed = screenings.latestSigned(staff, episode.id());
        if (signed.isEmpty()) {
            return new Prepared(episode, null, List.of(EnvelopeBlock.NO_SIGNED_SCREENING), null);
        }
        SignedScreeningFacts facts = signed.get();
        PatientSummary patient = patients.find(staff, episode.patientId()).orElseThrow();
        List<ClubView> inService = clubs.active(staff);
        List<EnvelopeBlock> blocks = new ArrayList<>();
        if (facts.redFlagsOpen() || episode.onHold()) {
            blocks.add(EnvelopeBlock.RED_FLAG_OPEN);
        }
        if ("HOLD".equals(facts.shoulderBand())) {
            blocks.add(EnvelopeBlock.SHOULDER_HOLD);
        }
        if (facts.shoulderFlexionTorqueInvolvedNm() == null && facts.shoulderFlexionTorqueWeakerNm() == null) {
            blocks.add(EnvelopeBlock.NO_SHOULDER_TORQUE);
        }
        if (!bodyWithinModel(patient, facts)) {
            blocks.add(EnvelopeBlock.BODY_OUTSIDE_MODEL);
        }
        if (inService.isEmpty()) {
            blocks.add(EnvelopeBlock.NO_CLUBS);
        }
        if (!blocks.isEmpty()) {
            return new Prepared(episode, facts, List.copyOf(blocks), null);
        }
        CurrentRuleSet rules = practiceRules.version(staff, facts.rulesVersion());
        double cycleTime = usualCycleTime(staff, episode, facts, requestedCycleTimeS);
        EnvelopeInputs inputs = new EnvelopeInputs(facts.screeningId(), facts.version(),
                new EnvelopeInputs.BodyInput(patient.statureM(), patient.bodyMassKg(), facts.shoulderToGripMeasuredM()),
                new EnvelopeInputs.CapacityInput(facts.shoulderBand(), facts.shoulderBandFraction(),
                        facts.lumbopelvicBand(), facts.shoulderFlexionTorqueInvolvedNm(),
                        facts.shoulderFlexionTorqueWeakerNm(), facts.gripStrengthInvolvedKg(),
                        facts.gripStrengthWeakerKg(), facts.activeFlexionInvolvedDeg()),
                new EnvelopeInputs.RulesInput(rules.version(),
                        Double.isNaN(rules.gripFraction()) ? null : rules.gripFraction(), rules.controlledStop(),
                        rules.rangeMarginDeg(), rules.hipDrivenMinimumBand()),
                cycleTime, inService, patterns.all(staff), EngineVersion.ENGINE_VERSION);
        return new Prepared(episode, facts, List.of(), inputs);
    }

    /** The requested cycle time if it lies in the searched range, else the last one used, else the default. */
    private double usualCycleTime(CurrentStaff staff, EpisodeSummary episode, SignedScreeningFacts facts,
                                  Double requested) {
        if (requested != null && requested >= EnvelopeCalculator.MIN_CYCLE_TIME_S
                && requested <= EnvelopeCalculator.MAX_CYCLE_TIME_S) {
            return requested;
        }
        return snapshots.lastCycleTime(staff.clinicId(), episode.id(), facts.screeningId(), facts.version())
                .orElse(DEFAULT_CYCLE_TIME_S);
    }

    private EnvelopeSnapshotView ensure(CurrentStaff staff, Prepared prepared) {
        EnvelopeInputs inputs = prepared.inputs();
        String document = snapshots.document(inputs);
        UUID episodeId = prepared.episode().id();
        return snapshots.findByDigest(staff.clinicId(), episodeId, EnvelopeSnapshots.digest(document))
                .orElseGet(() -> {
                    EnvelopeOutputs outputs = EnvelopeComputation.compute(inputs);
                    EnvelopeSnapshotView stored = snapshots.insert(staff.clinicId(), episodeId,
                            prepared.episode().patientId(), inputs, document, outputs, clock.instant(),
                            staff.staffId());
                    audit.record(staff, "ENVELOPE_COMPUTE", "EnvelopeSnapshot", stored.id(),
                            prepared.episode().patientId(), "rows=" + outputs.rows().size());
                    return stored;
                });
    }

    private static boolean bodyWithinModel(PatientSummary patient, SignedScreeningFacts facts) {
        Double reach = facts.shoulderToGripMeasuredM();
        return patient.statureM() >= Body.MIN_STATURE_M && patient.statureM() <= Body.MAX_STATURE_M
                && patient.bodyMassKg() >= Body.MIN_MASS_KG && patient.bodyMassKg() <= Body.MAX_MASS_KG
                && (reach == null || reach >= Body.MIN_SHOULDER_TO_GRIP_M && reach <= Body.MAX_SHOULDER_TO_GRIP_M);
    }

    private static String verdictKey(WhatIf w) {
        return switch (w.status()) {
            case EnvelopeRow.NO_CAPACITY -> "envelope.verdict.noCapacity";
            case EnvelopeRow.INVALID -> "envelope.verdict.invalid";
            default -> w.permitted() ? "envelope.verdict.permitted" : "envelope.verdict.notPermitted";
        };
    }

    private String text(String key) {
        return messages.getMessage(key, null, key, LocaleContextHolder.getLocale());
    }

    private EpisodeSummary loadEpisode(CurrentStaff staff, UUID episodeId, String action) {
        return patients.findEpisode(staff, episodeId)
                .orElseThrow(() -> denied(staff, action, "Episode", episodeId));
    }

    private NotFoundException denied(CurrentStaff staff, String action, String type, UUID id) {
        audit.recordDenied(staff, action, type, id, "not in caller's clinic or missing");
        return new NotFoundException(type);
    }
}
