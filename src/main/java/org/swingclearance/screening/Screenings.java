package org.swingclearance.screening;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.UUID;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.audit.AuditDetail;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffAccounts;
import org.swingclearance.patient.EpisodeStatus;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.PatientSummary;
import org.swingclearance.patient.Patients;
import org.swingclearance.patient.RedFlag;
import org.swingclearance.patient.RedFlagContext;
import org.swingclearance.patient.Side;
import org.swingclearance.rules.CurrentRuleSet;
import org.swingclearance.rules.PracticeRules;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * The screening application service: start, save, preview, sign and amend screenings of an episode, and read them
 * for pages and other features. Every method is scoped to the caller's clinic; another clinic's screening or
 * episode is answered "not found" and the attempt audited. Reads and changes are audited (ids and reasons only).
 */
@Service
public class Screenings {

    private static final int REASON_MAX = 2000;

    private final ScreeningRepository screenings;
    private final ScreeningVersionRepository versions;
    private final Patients patients;
    private final PracticeRules rules;
    private final StaffAccounts staffAccounts;
    private final AuditLog audit;
    private final Clock clock;

    Screenings(ScreeningRepository screenings, ScreeningVersionRepository versions, Patients patients,
               PracticeRules rules, StaffAccounts staffAccounts, AuditLog audit, Clock clock) {
        this.screenings = screenings;
        this.versions = versions;
        this.patients = patients;
        this.rules = rules;
        this.staffAccounts = staffAccounts;
        this.audit = audit;
        this.clock = clock;
    }

    /**
     * Opens the episode's draft screening, or starts one. A new draft's red-flag checklist starts from the flags
     * still open on the episode, so the suggestion is Hold until the clinician re-checks them.
     */
    @Transactional
    public UUID start(CurrentStaff staff, UUID episodeId) {
        EpisodeSummary episode = patients.findEpisode(staff, episodeId)
                .orElseThrow(() -> denied(staff, "SCREENING_CREATE", "Episode", episodeId));
        if (episode.status() == EpisodeStatus.CLOSED) {
            throw new InvalidStateException("screening.error.episodeClosed");
        }
        List<Screening> existing = screenings.findByClinicIdAndEpisodeIdOrderByCreatedAtAsc(staff.clinicId(), episodeId);
        for (Screening s : existing) {
            if (latestVersion(s).getStatus() == ScreeningStatus.DRAFT) {
                return s.getId();
            }
        }
        Instant now = now();
        Screening screening = new Screening(UUID.randomUUID(), staff.clinicId(), episode.patientId(), episodeId, now,
                staff.staffId());
        screenings.saveAndFlush(screening);
        Set<RedFlag> open = episode.openRedFlags().isEmpty() ? Set.of() : EnumSet.copyOf(episode.openRedFlags());
        Measurements initial = new Measurements(Map.of(), open);
        ScreeningVersion draft = new ScreeningVersion(UUID.randomUUID(), screening.getId(), staff.clinicId(), 1, null,
                null, staff.staffId(), now, content(staff, screening, initial));
        versions.saveAndFlush(draft);
        audit.record(staff, "SCREENING_CREATE", "Screening", screening.getId(), episode.patientId(),
                "episode=" + episodeId);
        return screening.getId();
    }

    /** The screening's latest version with the list of versions; audited as a read. */
    @Transactional
    public ScreeningPage page(CurrentStaff staff, UUID screeningId) {
        Screening screening = load(staff, screeningId, "SCREENING_READ");
        return page(staff, screening, latestVersion(screening).getVersionNo());
    }

    /** One version of the screening (older versions stay visible); audited as a read. */
    @Transactional
    public ScreeningPage page(CurrentStaff staff, UUID screeningId, int versionNo) {
        Screening screening = load(staff, screeningId, "SCREENING_READ");
        return page(staff, screening, versionNo);
    }

    /**
     * What the engine makes of typed measurements, without saving anything: derived values, findings, suggested
     * bands, gaps. Not audited: it returns only what was sent and what the audited page read already showed.
     */
    @Transactional(readOnly = true)
    public ScreeningSnapshot preview(CurrentStaff staff, UUID screeningId, Measurements measurements) {
        Screening screening = load(staff, screeningId, "SCREENING_PREVIEW");
        return ScreeningEvaluator.evaluate(context(staff, screening), measurements);
    }

    /**
     * Saves the draft's measurements and recomputes its snapshot.
     *
     * @param lockVersion the draft version the form was opened with; a different one means someone saved since
     * @return the draft's new lock version
     */
    @Transactional
    public long saveDraft(CurrentStaff staff, UUID screeningId, long lockVersion, Measurements measurements) {
        Screening screening = load(staff, screeningId, "SCREENING_UPDATE");
        ScreeningVersion draft = openDraft(screening, lockVersion);
        Measurements before = ScreeningJson.readMeasurements(draft.getMeasurements());
        draft.update(content(staff, screening, measurements), now());
        versions.saveAndFlush(draft);
        if (!before.redFlags().equals(measurements.redFlags())) {
            // A changed checklist takes effect on the episode at once, not only at signing.
            patients.recordRedFlags(staff, screening.getEpisodeId(), RedFlagContext.SCREENING, measurements.redFlags());
        }
        audit.record(staff, "SCREENING_UPDATE", "Screening", screeningId, screening.getPatientId(),
                "version=" + draft.getVersionNo());
        return draft.getLockVersion();
    }

    /**
     * Signs the saved draft with the clinician's band decision, re-evaluated under the clinic's current rules.
     * Refused (nothing signed) while a value a required or fired rule needs is missing, while an override has no
     * reason, or when red flags are open and a band other than Hold is chosen.
     *
     * @throws ScreeningRefused with the reasons
     */
    @Transactional
    public void sign(CurrentStaff staff, UUID screeningId, long lockVersion, Decision decision) {
        Screening screening = load(staff, screeningId, "SCREENING_SIGN");
        ScreeningVersion draft = openDraft(screening, lockVersion);
        Measurements measurements = ScreeningJson.readMeasurements(draft.getMeasurements());
        EvaluationContext ctx = context(staff, screening);
        ScreeningSnapshot snapshot = ScreeningEvaluator.evaluate(ctx, measurements);

        List<ScreeningRefused.Problem> problems = new ArrayList<>();
        if (!snapshot.missingForSigning().isEmpty()) {
            List<String> names = snapshot.missingForSigning().stream().map(ScreeningSnapshot.Missing::measurement)
                    .distinct().toList();
            problems.add(new ScreeningRefused.Problem(null, "screening.sign.missing", List.of(String.join(",", names))));
        }
        String shoulder = decide(snapshot.shoulder().band(), decision.shoulderBand(),
                decision.shoulderOverrideReason(), snapshot.redFlagsOpen(), "shoulder", problems);
        String lumbopelvic = decide(snapshot.lumbopelvic().band(), decision.lumbopelvicBand(),
                decision.lumbopelvicOverrideReason(), snapshot.redFlagsOpen(), "lumbopelvic", problems);
        if (!problems.isEmpty()) {
            throw new ScreeningRefused(problems);
        }
        String shoulderReason = shoulder.equals(snapshot.shoulder().band()) ? null
                : decision.shoulderOverrideReason().trim();
        String lumbopelvicReason = lumbopelvic.equals(snapshot.lumbopelvic().band()) ? null
                : decision.lumbopelvicOverrideReason().trim();

        Instant now = now();
        draft.update(stored(ctx, measurements, snapshot), now);
        draft.sign(shoulder, shoulderReason, lumbopelvic, lumbopelvicReason, staff.staffId(), now,
                v -> ScreeningContentHash.of(screening, v));
        versions.saveAndFlush(draft);
        patients.recordRedFlags(staff, screening.getEpisodeId(), RedFlagContext.SCREENING, measurements.redFlags());
        audit.record(staff, "SCREENING_SIGN", "Screening", screeningId, screening.getPatientId(),
                AuditDetail.of("episode", screening.getEpisodeId(), "version", draft.getVersionNo(),
                        "versionId", draft.getId(), "rules", "v" + ctx.rules().version()));
        if (shoulderReason != null) {
            audit.record(staff, "BAND_OVERRIDE", "Screening", screeningId, screening.getPatientId(),
                    AuditDetail.of("versionId", draft.getId(), "region", "SHOULDER", "reason", shoulderReason));
        }
        if (lumbopelvicReason != null) {
            audit.record(staff, "BAND_OVERRIDE", "Screening", screeningId, screening.getPatientId(),
                    AuditDetail.of("versionId", draft.getId(), "region", "LUMBOPELVIC", "reason", lumbopelvicReason));
        }
    }

    /**
     * Starts a correction of a signed screening: a new draft version that supersedes the latest signed one, with the
     * reason, starting from its measurements. The signed version stays as it is.
     *
     * @return the new version's number
     */
    @Transactional
    public int amend(CurrentStaff staff, UUID screeningId, String reason) {
        Screening screening = load(staff, screeningId, "SCREENING_AMEND");
        if (reason == null || reason.isBlank() || reason.trim().length() > REASON_MAX) {
            throw new ScreeningRefused(List.of(new ScreeningRefused.Problem("reason", "screening.amend.reasonRequired",
                    List.of())));
        }
        ScreeningVersion latest = latestVersion(screening);
        if (!latest.getStatus().signed()) {
            throw new InvalidStateException("screening.amend.draftOpen");
        }
        Measurements measurements = ScreeningJson.readMeasurements(latest.getMeasurements());
        ScreeningVersion amendment = new ScreeningVersion(UUID.randomUUID(), screeningId, staff.clinicId(),
                latest.getVersionNo() + 1, latest.getId(), reason.trim(), staff.staffId(), now(),
                content(staff, screening, measurements));
        versions.saveAndFlush(amendment);
        audit.record(staff, "SCREENING_AMEND", "Screening", screeningId, screening.getPatientId(),
                AuditDetail.of("version", amendment.getVersionNo(), "versionId", amendment.getId(), "supersedes",
                        latest.getId()));
        return amendment.getVersionNo();
    }

    /**
     * The latest signed screening of an episode (Contract S); empty when none is signed or the episode is not the
     * caller's clinic's. Not audited: callers audit their own read.
     */
    @Transactional(readOnly = true)
    public Optional<SignedScreeningFacts> latestSigned(CurrentStaff staff, UUID episodeId) {
        Optional<EpisodeSummary> episode = patients.findEpisode(staff, episodeId);
        if (episode.isEmpty()) {
            return Optional.empty();
        }
        return latestSignedVersion(staff.clinicId(), episodeId, null).map(pair -> facts(staff, episode.get(), pair));
    }

    /** The patient page panel: screenings per episode, current bands, trend; audited as one read. */
    @Transactional
    public PatientScreenings forPatient(CurrentStaff staff, UUID patientId) {
        PatientSummary patient = patients.find(staff, patientId)
                .orElseThrow(() -> denied(staff, "SCREENING_READ", "Patient", patientId));
        List<Screening> all = screenings.findByClinicIdAndPatientIdOrderByCreatedAtAsc(staff.clinicId(), patientId);
        Map<UUID, List<ScreeningVersion>> byScreening = versionsOf(staff.clinicId(), all);
        Map<UUID, String> names = new HashMap<>();
        List<PatientScreenings.EpisodeScreenings> episodes = new ArrayList<>();
        List<PatientScreenings.TrendPoint> trend = new ArrayList<>();
        for (EpisodeSummary episode : patients.episodesOf(staff, patient.id())) {
            List<PatientScreenings.Entry> entries = new ArrayList<>();
            PatientScreenings.Entry current = null;
            Instant currentAt = null;
            UUID draft = null;
            for (Screening s : all) {
                if (!s.getEpisodeId().equals(episode.id())) {
                    continue;
                }
                List<ScreeningVersion> vs = byScreening.get(s.getId());
                ScreeningVersion latest = vs.get(vs.size() - 1);
                entries.add(entry(staff, s, latest, names));
                if (latest.getStatus() == ScreeningStatus.DRAFT) {
                    draft = s.getId();
                }
                ScreeningVersion signed = latestSignedOf(vs);
                if (signed != null) {
                    if (currentAt == null || signed.getSignedAt().isAfter(currentAt)) {
                        current = entry(staff, s, signed, names);
                        currentAt = signed.getSignedAt();
                    }
                    trend.add(new PatientScreenings.TrendPoint(signed.getSignedAt(), episode.id(),
                            ScreeningJson.readSnapshot(signed.getSnapshot()).values(),
                            ScreeningJson.readMeasurements(signed.getMeasurements()).values()));
                }
            }
            entries.sort(Comparator.comparing(PatientScreenings.Entry::createdAt).reversed());
            episodes.add(new PatientScreenings.EpisodeScreenings(episode.id(), episode.region().name(),
                    episode.shoulderSide() == null ? null : episode.shoulderSide().name(), entries, current, draft));
        }
        trend.sort(Comparator.comparing(PatientScreenings.TrendPoint::signedAt));
        audit.record(staff, "SCREENING_READ", "Patient", patientId, patientId, "screenings=" + all.size());
        return new PatientScreenings(patientId, episodes, trend);
    }

    /** The clinic's draft screenings, most recently changed first, for the clinician's home; audited as one read. */
    @Transactional
    public List<DraftSummary> drafts(CurrentStaff staff) {
        List<ScreeningVersion> drafts = versions.findByClinicIdAndStatusOrderByUpdatedAtDesc(staff.clinicId(),
                ScreeningStatus.DRAFT);
        Map<UUID, String> names = new HashMap<>();
        List<DraftSummary> result = new ArrayList<>();
        for (ScreeningVersion v : drafts) {
            Screening s = screenings.findByIdAndClinicId(v.getScreeningId(), staff.clinicId()).orElseThrow();
            PatientSummary patient = patients.find(staff, s.getPatientId()).orElseThrow();
            String region = patients.findEpisode(staff, s.getEpisodeId()).map(e -> e.region().name()).orElse(null);
            result.add(new DraftSummary(s.getId(), v.getVersionNo(), patient.id(), patient.label(), region,
                    v.getUpdatedAt(), name(staff, v.getCreatedBy(), names), v.getVersionNo() > 1));
        }
        audit.record(staff, "SCREENING_READ", "Screening", null, null, "drafts=" + result.size());
        return result;
    }

    // --- internals -------------------------------------------------------------------------------------------

    private ScreeningPage page(CurrentStaff staff, Screening screening, int versionNo) {
        List<ScreeningVersion> all = versions.findByClinicIdAndScreeningIdOrderByVersionNoAsc(staff.clinicId(),
                screening.getId());
        ScreeningVersion shown = all.stream().filter(v -> v.getVersionNo() == versionNo).findFirst()
                .orElseThrow(() -> new NotFoundException("Screening version"));
        PatientSummary patient = patients.find(staff, screening.getPatientId()).orElseThrow();
        EpisodeSummary episode = patients.findEpisode(staff, screening.getEpisodeId()).orElseThrow();
        Map<UUID, String> names = new HashMap<>();
        Map<UUID, Integer> numbers = new HashMap<>();
        all.forEach(v -> numbers.put(v.getId(), v.getVersionNo()));
        List<ScreeningPage.VersionSummary> list = all.stream().map(v -> new ScreeningPage.VersionSummary(
                v.getVersionNo(), v.getStatus(), v.getChangeReason(), name(staff, v.getCreatedBy(), names),
                v.getCreatedAt(), name(staff, v.getSignedBy(), names), v.getSignedAt(), v.getShoulderBand(),
                v.getLumbopelvicBand())).toList();
        byte[] hash = shown.getContentHash();
        Boolean verifies = hash == null ? null : Arrays.equals(hash, ScreeningContentHash.of(screening, shown));
        ScreeningPage.VersionDetail detail = new ScreeningPage.VersionDetail(shown.getId(), shown.getVersionNo(),
                shown.getStatus(), shown.getLockVersion(), ScreeningJson.readMeasurements(shown.getMeasurements()),
                ScreeningJson.readSnapshot(shown.getSnapshot()), numbers.get(shown.getSupersedesVersionId()),
                shown.getChangeReason(), shown.getShoulderBand(), shown.getShoulderOverrideReason(),
                shown.getLumbopelvicBand(), shown.getLumbopelvicOverrideReason(),
                name(staff, shown.getCreatedBy(), names), shown.getCreatedAt(), name(staff, shown.getSignedBy(), names),
                shown.getSignedAt(), hash == null ? null : HexFormat.of().formatHex(hash), verifies);
        audit.record(staff, "SCREENING_READ", "Screening", screening.getId(), screening.getPatientId(),
                "version=" + versionNo);
        return new ScreeningPage(screening.getId(), patient, episode, detail, list);
    }

    private String decide(String suggested, String chosen, String reason, boolean redFlags, String region,
                          List<ScreeningRefused.Problem> problems) {
        if (chosen == null || chosen.equals(suggested)) {
            return suggested;
        }
        if (Arrays.stream(LoadBand.values()).noneMatch(b -> b.name().equals(chosen))) {
            problems.add(new ScreeningRefused.Problem(region + "Band", "screening.decision.unknownBand", List.of()));
            return suggested;
        }
        if (redFlags && !chosen.equals(LoadBand.HOLD.name())) {
            problems.add(new ScreeningRefused.Problem(region + "Band", "screening.decision.redFlagsHold", List.of()));
        }
        if (reason == null || reason.isBlank()) {
            problems.add(new ScreeningRefused.Problem(region + "OverrideReason", "screening.decision.reasonRequired",
                    List.of()));
        } else if (reason.trim().length() > REASON_MAX) {
            problems.add(new ScreeningRefused.Problem(region + "OverrideReason", "screening.decision.reasonTooLong",
                    List.of(String.valueOf(REASON_MAX))));
        }
        return chosen;
    }

    private ScreeningVersion.StoredContent content(CurrentStaff staff, Screening screening, Measurements m) {
        EvaluationContext ctx = context(staff, screening);
        return stored(ctx, m, ScreeningEvaluator.evaluate(ctx, m));
    }

    private static ScreeningVersion.StoredContent stored(EvaluationContext ctx, Measurements m,
                                                         ScreeningSnapshot snapshot) {
        return new ScreeningVersion.StoredContent(ScreeningJson.write(m), ScreeningJson.write(snapshot),
                ctx.rules().id(), ctx.rules().version(), snapshot.engineVersion(), snapshot.shoulder().band(),
                snapshot.lumbopelvic().band(), snapshot.redFlagsOpen());
    }

    private EvaluationContext context(CurrentStaff staff, Screening screening) {
        PatientSummary patient = patients.find(staff, screening.getPatientId()).orElseThrow();
        EpisodeSummary episode = patients.findEpisode(staff, screening.getEpisodeId()).orElseThrow();
        CurrentRuleSet current = rules.current(staff.clinicId());
        EvaluationContext.PreviousSigned previous = latestSignedVersion(staff.clinicId(), screening.getEpisodeId(),
                screening).map(pair -> new EvaluationContext.PreviousSigned(pair.screening().getId(),
                pair.version().getVersionNo(), pair.version().getSignedAt(),
                ScreeningJson.readSnapshot(pair.version().getSnapshot()))).orElse(null);
        return new EvaluationContext(patient, episode, LocalDate.ofInstant(clock.instant(), ZoneOffset.UTC), current,
                previous);
    }

    /** A screening and one of its versions. */
    private record Signed(Screening screening, ScreeningVersion version) {
    }

    /**
     * The most recently signed version among the episode's screenings; with {@code before}, only screenings started
     * before that one (the baseline its changes compare with).
     */
    private Optional<Signed> latestSignedVersion(UUID clinicId, UUID episodeId, Screening before) {
        List<Screening> all = screenings.findByClinicIdAndEpisodeIdOrderByCreatedAtAsc(clinicId, episodeId);
        Map<UUID, List<ScreeningVersion>> byScreening = versionsOf(clinicId, all);
        Signed best = null;
        for (Screening s : all) {
            if (before != null && (s.getId().equals(before.getId()) || !s.getCreatedAt().isBefore(before.getCreatedAt()))) {
                continue;
            }
            ScreeningVersion signed = latestSignedOf(byScreening.get(s.getId()));
            if (signed != null && (best == null || signed.getSignedAt().isAfter(best.version().getSignedAt()))) {
                best = new Signed(s, signed);
            }
        }
        return Optional.ofNullable(best);
    }

    private Map<UUID, List<ScreeningVersion>> versionsOf(UUID clinicId, List<Screening> all) {
        Map<UUID, List<ScreeningVersion>> byScreening = new LinkedHashMap<>();
        all.forEach(s -> byScreening.put(s.getId(), new ArrayList<>()));
        if (!all.isEmpty()) {
            versions.findByClinicIdAndScreeningIdInOrderByVersionNoAsc(clinicId,
                    all.stream().map(Screening::getId).toList()).forEach(v -> byScreening.get(v.getScreeningId()).add(v));
        }
        return byScreening;
    }

    private static ScreeningVersion latestSignedOf(List<ScreeningVersion> vs) {
        ScreeningVersion result = null;
        for (ScreeningVersion v : vs) {
            if (v.getStatus().signed()) {
                result = v;
            }
        }
        return result;
    }

    private SignedScreeningFacts facts(CurrentStaff staff, EpisodeSummary episode, Signed signed) {
        ScreeningVersion v = signed.version();
        ScreeningSnapshot snapshot = ScreeningJson.readSnapshot(v.getSnapshot());
        Measurements m = ScreeningJson.readMeasurements(v.getMeasurements());
        Map<String, Double> values = snapshot.values();
        Side side = Side.valueOf(snapshot.inputs().factsSide());
        CurrentRuleSet used = rules.byId(staff.clinicId(), v.getRuleSetId()).orElseThrow();
        String flexion = ScreeningEvaluator.SideValue.SHOULDER_FLEXION_TORQUE.name();
        String grip = ScreeningEvaluator.SideValue.GRIP_BEST.name();
        Double reach = m.get(Measurement.SHOULDER_TO_GRIP_DISTANCE, side);
        return new SignedScreeningFacts(signed.screening().getId(), v.getVersionNo(), v.getSignedAt(), episode.id(),
                episode.patientId(), v.getShoulderBand(), v.getLumbopelvicBand(), used.fraction(v.getShoulderBand()),
                used.fraction(v.getLumbopelvicBand()), values.get(flexion + "_" + side.name()),
                weaker(values, flexion), values.get(grip + "_" + side.name()), weaker(values, grip),
                m.get(Measurement.SHOULDER_FLEXION_ACTIVE, side), reach == null ? null : reach / 100.0,
                v.getRulesVersion(), episode.onHold());
    }

    /** The weaker side's value; null unless both sides were tested (the weaker side is then unknown). */
    private static Double weaker(Map<String, Double> values, String key) {
        Double left = values.get(key + "_" + Side.LEFT.name());
        Double right = values.get(key + "_" + Side.RIGHT.name());
        return left == null || right == null ? null : Math.min(left, right);
    }

    private PatientScreenings.Entry entry(CurrentStaff staff, Screening s, ScreeningVersion v, Map<UUID, String> names) {
        boolean overridden = v.getShoulderOverrideReason() != null || v.getLumbopelvicOverrideReason() != null;
        return new PatientScreenings.Entry(s.getId(), v.getVersionNo(), v.getStatus(), s.getCreatedAt(),
                name(staff, s.getCreatedBy(), names), v.getSignedAt(), name(staff, v.getSignedBy(), names),
                v.getShoulderBand(), v.getLumbopelvicBand(), overridden, v.getChangeReason());
    }

    private ScreeningVersion openDraft(Screening screening, long lockVersion) {
        ScreeningVersion latest = latestVersion(screening);
        if (latest.getStatus() != ScreeningStatus.DRAFT) {
            throw new InvalidStateException("screening.error.signed");
        }
        if (latest.getLockVersion() != lockVersion) {
            throw new ConflictException("screening");
        }
        return latest;
    }

    private ScreeningVersion latestVersion(Screening screening) {
        List<ScreeningVersion> all = versions.findByClinicIdAndScreeningIdOrderByVersionNoAsc(screening.getClinicId(),
                screening.getId());
        return all.get(all.size() - 1);
    }

    private Screening load(CurrentStaff staff, UUID screeningId, String action) {
        return screenings.findByIdAndClinicId(screeningId, staff.clinicId())
                .orElseThrow(() -> denied(staff, action, "Screening", screeningId));
    }

    private String name(CurrentStaff staff, UUID staffId, Map<UUID, String> cache) {
        if (staffId == null) {
            return null;
        }
        return cache.computeIfAbsent(staffId, id -> staffAccounts.find(staff, id).map(s -> s.displayName()).orElse("?"));
    }

    private Instant now() {
        return clock.instant().truncatedTo(ChronoUnit.MICROS);
    }

    private NotFoundException denied(CurrentStaff staff, String action, String type, UUID id) {
        audit.recordDenied(staff, action, type, id, "not in caller's clinic or missing");
        return new NotFoundException(type);
    }
}
