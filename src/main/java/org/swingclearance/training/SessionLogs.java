package org.swingclearance.training;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import org.springframework.dao.DataIntegrityViolationException;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.audit.AuditLog;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.EpisodeSummary;
import org.swingclearance.patient.PatientSummary;
import org.swingclearance.patient.Patients;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.InvalidStateException;
import org.swingclearance.web.NotFoundException;

/**
 * The training feature's application service: logging sessions, corrections and next-morning pain (append-only),
 * the training log page with its load report, and the alerts those entries raise. A clinician reaches every
 * episode of their clinic; a trainer only the episodes whose current issued plan is shared with them. Anything
 * else is "not found" and audited. Every read and change is audited inside its transaction.
 */
@Service
public class SessionLogs {

    /** How long an acknowledged alert still shows the trainer that the clinician reviewed it. */
    private static final int REVIEWED_NOTICE_DAYS = 14;

    private final SessionLogRepository logs;
    private final SessionLogVersionRepository versions;
    private final MorningPainRepository mornings;
    private final TrainingAlertRepository alerts;
    private final Patients patients;
    private final PlanSource plans;
    private final AlertLimitSource limits;
    private final LoadAnalysis analysis;
    private final AuditLog audit;
    private final Clock clock;

    SessionLogs(SessionLogRepository logs, SessionLogVersionRepository versions, MorningPainRepository mornings,
                TrainingAlertRepository alerts, Patients patients, PlanSource plans, AlertLimitSource limits,
                LoadAnalysis analysis, AuditLog audit, Clock clock) {
        this.logs = logs;
        this.versions = versions;
        this.mornings = mornings;
        this.alerts = alerts;
        this.patients = patients;
        this.plans = plans;
        this.limits = limits;
        this.analysis = analysis;
        this.audit = audit;
        this.clock = clock;
    }

    /** The training log page of an episode: sessions, alerts, advice and the load report. */
    @Transactional
    public Workspace workspace(CurrentStaff staff, UUID episodeId) {
        Access access = access(staff, episodeId, "LOAD_READ");
        LocalDate today = today();
        EpisodeSessions sessions = sessionsOf(staff, episodeId);
        AlertLimits current = limits.current(staff.clinicId());
        LoadView load = analysis.report(sessions.logged(), access.plan(), today, current);
        List<AlertView> alertViews = alertViews(staff, episodeId, access.patientLabel(), sessions);
        audit.record(staff, "LOAD_READ", "Episode", episodeId, access.patientId(), "sessions=" + sessions.latest().size());
        TrainingPlan plan = access.plan();
        return new Workspace(episodeId, access.patientId(), access.patientLabel(), plan,
                plan == null ? null : plan.currentStepOn(today), today,
                sessionViews(staff, sessions), alertViews, advice(alertViews, today), load, current,
                staff.is(StaffRole.CLINICIAN));
    }

    /** The plan a new session is logged against; refused (as a state, not an access problem) when none is issued. */
    @Transactional
    public TrainingPlan planForLogging(CurrentStaff staff, UUID episodeId) {
        Access access = access(staff, episodeId, "TRAINING_PLAN_READ");
        TrainingPlan plan = requirePlan(access);
        audit.record(staff, "TRAINING_PLAN_READ", "Plan", plan.planId(), access.patientId(), "version=" + plan.version());
        return plan;
    }

    /** Today, by the application clock (forms use it as the latest allowed session date). */
    public LocalDate today() {
        return LocalDate.now(clock);
    }

    /** Logs a new session; two people logging the same day each keep their own entry. */
    @Transactional
    public UUID log(CurrentStaff staff, UUID episodeId, SessionEntry entry) {
        Access access = access(staff, episodeId, "SESSION_LOG_CREATE");
        TrainingPlan plan = requirePlan(access);
        rejectIfInvalid(SessionEntryCheck.violations(entry, plan, today()));
        Instant now = clock.instant();
        SessionLog log = new SessionLog(UUID.randomUUID(), staff.clinicId(), access.patientId(), episodeId,
                staff.staffId(), now);
        logs.save(log);
        SessionLogVersion version = newVersion(staff, log.getId(), 1, plan, entry, null, now);
        audit.record(staff, "SESSION_LOG_CREATE", "SessionLog", log.getId(), access.patientId(), "version=1");
        raiseForSession(staff, access, plan, version);
        return log.getId();
    }

    /** One session with its history, for the correction and next-morning forms. */
    @Transactional
    public SessionHistory session(CurrentStaff staff, UUID episodeId, UUID logId) {
        Access access = access(staff, episodeId, "SESSION_LOG_READ");
        SessionLog log = requireLog(staff, access, logId, "SESSION_LOG_READ");
        List<SessionLogVersion> all = versions.findByClinicIdAndSessionLogIdOrderByVersionDesc(staff.clinicId(), logId);
        List<MorningPain> morning = mornings.findByClinicIdAndSessionLogIdOrderByVersionDesc(staff.clinicId(), logId);
        audit.record(staff, "SESSION_LOG_READ", "SessionLog", logId, access.patientId(), "versions=" + all.size());
        SessionLogVersion latest = all.get(0);
        SessionView view = sessionView(staff, log, latest, morning.isEmpty() ? null : morning.get(0),
                analysis.sessionLoad(latest), analysis.dose(latest));
        return new SessionHistory(episodeId, view, all.stream().map(SessionHistory.VersionLine::of).toList(),
                morning.stream().map(SessionHistory.MorningLine::of).toList(), access.plan(), access.patientLabel());
    }

    /**
     * Corrects a session: a new version with a reason; the earlier versions stay as they were. Refused as a
     * conflict when someone corrected it after {@code expectedVersion} was read.
     */
    @Transactional
    public void correct(CurrentStaff staff, UUID episodeId, UUID logId, int expectedVersion, SessionEntry entry,
                        String reason) {
        Access access = access(staff, episodeId, "SESSION_LOG_CORRECT");
        SessionLog log = requireLog(staff, access, logId, "SESSION_LOG_CORRECT");
        requireMayCorrect(staff, log);
        TrainingPlan plan = requirePlan(access);
        if (reason == null || reason.isBlank()) {
            throw new SessionEntryRejected(List.of(new FieldViolation("reason", "NotBlank")));
        }
        rejectIfInvalid(SessionEntryCheck.violations(entry, plan, today()));
        int latest = versions.findFirstByClinicIdAndSessionLogIdOrderByVersionDesc(staff.clinicId(), logId)
                .map(SessionLogVersion::getVersion).orElseThrow();
        if (latest != expectedVersion) {
            throw new ConflictException("session log");
        }
        SessionLogVersion version = newVersion(staff, logId, latest + 1, plan, entry, reason, clock.instant());
        audit.record(staff, "SESSION_LOG_CORRECT", "SessionLog", logId, access.patientId(),
                "version=" + version.getVersion());
        raiseForSession(staff, access, plan, version);
    }

    /**
     * Records the next-morning pain of a session (from the day after it); replacing an earlier rating is a new
     * version with a reason. {@code expectedVersion} is the rating version the person saw (0 for none).
     */
    @Transactional
    public void recordMorningPain(CurrentStaff staff, UUID episodeId, UUID logId, int expectedVersion, int pain,
                                  String reason) {
        Access access = access(staff, episodeId, "SESSION_MORNING_PAIN");
        SessionLog log = requireLog(staff, access, logId, "SESSION_MORNING_PAIN");
        SessionLogVersion session = versions.findFirstByClinicIdAndSessionLogIdOrderByVersionDesc(staff.clinicId(),
                logId).orElseThrow();
        rejectIfInvalid(SessionEntryCheck.morningViolations(session.getSessionDate(), today()));
        int latest = mornings.findFirstByClinicIdAndSessionLogIdOrderByVersionDesc(staff.clinicId(), logId)
                .map(MorningPain::getVersion).orElse(0);
        if (latest != expectedVersion) {
            throw new ConflictException("next-morning pain");
        }
        if (latest > 0) {
            requireMayCorrect(staff, log);
            if (reason == null || reason.isBlank()) {
                throw new SessionEntryRejected(List.of(new FieldViolation("reason", "NotBlank")));
            }
        }
        MorningPain entry = new MorningPain(UUID.randomUUID(), staff.clinicId(), logId, latest + 1, pain,
                latest == 0 ? null : reason, staff.staffId(), clock.instant());
        saveAppending(() -> mornings.saveAndFlush(entry));
        audit.record(staff, latest == 0 ? "SESSION_MORNING_PAIN" : "SESSION_MORNING_PAIN_CORRECT", "SessionLog",
                logId, access.patientId(), "version=" + entry.getVersion());
        TrainingPlan plan = access.plan();
        if (plan != null && plan.step(session.getStepNumber()).isPresent()) {
            AlertLimits current = limits.current(staff.clinicId());
            EpisodeSessions sessions = sessionsOf(staff, log.getEpisodeId());
            for (AlertFinding f : analysis.findingsForMorning(new LoggedSession(session, pain), entry,
                    sessions.logged(), plan, current)) {
                raise(staff, access, session, f, current);
            }
        }
    }

    /** The clinic's open alerts, newest first, for the clinician's home page. */
    @Transactional
    public List<AlertView> openAlerts(CurrentStaff staff) {
        List<TrainingAlert> open = alerts.findByClinicIdAndAcknowledgedAtIsNullOrderByRaisedAtDesc(staff.clinicId());
        Map<UUID, String> labels = new HashMap<>();
        List<AlertView> views = open.stream().map(a -> view(a, labels.computeIfAbsent(a.getPatientId(),
                id -> patients.find(staff, id).map(PatientSummary::label).orElse("")), false)).toList();
        audit.record(staff, "ALERT_LIST_READ", "TrainingAlert", null, null, "open=" + views.size());
        return views;
    }

    /** A patient's training summary for the patient page: the episodes with logs or alerts, and the alerts. */
    @Transactional
    public PatientTraining patientTraining(CurrentStaff staff, UUID patientId) {
        List<EpisodeSummary> episodes = patients.episodesOf(staff, patientId);
        String label = patients.find(staff, patientId).map(PatientSummary::label).orElse("");
        List<AlertView> views = alerts.findByClinicIdAndPatientIdOrderByRaisedAtDesc(staff.clinicId(), patientId)
                .stream().map(a -> view(a, label, superseded(staff, a))).toList();
        List<PatientTraining.EpisodeLog> withLogs = new ArrayList<>();
        for (EpisodeSummary e : episodes) {
            int count = logs.findByClinicIdAndEpisodeId(staff.clinicId(), e.id()).size();
            boolean planned = plans.currentFor(staff, e.id()).isPresent();
            if (count > 0 || planned) {
                withLogs.add(new PatientTraining.EpisodeLog(e.id(), e.injuryDate(), count, planned));
            }
        }
        audit.record(staff, "ALERT_LIST_READ", "Patient", patientId, patientId, "alerts=" + views.size());
        return new PatientTraining(patientId, withLogs, views);
    }

    /** The plans shared with a trainer, each with its advice, for the trainer's home page. */
    @Transactional
    public List<SharedLog> sharedLogs(CurrentStaff trainer) {
        List<SharedLog> result = new ArrayList<>();
        LocalDate today = today();
        for (TrainingPlan plan : plans.sharedWith(trainer)) {
            EpisodeSessions sessions = sessionsOf(trainer, plan.episodeId());
            List<AlertView> alertViews = alertViews(trainer, plan.episodeId(), plan.patientLabel(), sessions);
            result.add(new SharedLog(plan, plan.currentStepOn(today), advice(alertViews, today)));
        }
        audit.record(trainer, "ALERT_LIST_READ", "Plan", null, null, "shared=" + result.size());
        return result;
    }

    /** A clinician acknowledges an alert; a second acknowledgement, or one of a changed alert, is a conflict. */
    @Transactional
    public UUID acknowledge(CurrentStaff staff, UUID alertId, long expectedVersion, String note) {
        TrainingAlert alert = alerts.findByIdAndClinicId(alertId, staff.clinicId())
                .orElseThrow(() -> denied(staff, "ALERT_ACK", "TrainingAlert", alertId));
        if (!alert.isOpen() || alert.getVersion() != expectedVersion) {
            throw new ConflictException("alert");
        }
        alert.acknowledge(staff.staffId(), clock.instant(), note);
        alerts.saveAndFlush(alert);
        audit.record(staff, "ALERT_ACK", "TrainingAlert", alertId, alert.getPatientId(), "kind=" + alert.getKind());
        return alert.getEpisodeId();
    }

    // --- access -------------------------------------------------------------------------------------------------

    /** Who may see an episode's training: clinicians of the clinic; trainers with a share of its current plan. */
    private Access access(CurrentStaff staff, UUID episodeId, String action) {
        EpisodeSummary episode = patients.findEpisode(staff, episodeId)
                .orElseThrow(() -> denied(staff, action, "Episode", episodeId));
        Optional<TrainingPlan> plan = plans.currentFor(staff, episodeId);
        if (staff.is(StaffRole.CLINICIAN)) {
            String label = patients.find(staff, episode.patientId()).map(PatientSummary::label).orElse("");
            return new Access(episodeId, episode.patientId(), label, plan.orElse(null));
        }
        if (staff.is(StaffRole.TRAINER) && plan.isPresent()) {
            return new Access(episodeId, episode.patientId(), plan.get().patientLabel(), plan.get());
        }
        throw denied(staff, action, "Episode", episodeId);
    }

    private static TrainingPlan requirePlan(Access access) {
        if (access.plan() == null) {
            throw new InvalidStateException("training.noPlan");
        }
        return access.plan();
    }

    private SessionLog requireLog(CurrentStaff staff, Access access, UUID logId, String action) {
        return logs.findByIdAndClinicId(logId, staff.clinicId())
                .filter(l -> l.getEpisodeId().equals(access.episodeId()))
                .orElseThrow(() -> denied(staff, action, "SessionLog", logId));
    }

    private static void requireMayCorrect(CurrentStaff staff, SessionLog log) {
        if (!mayCorrect(staff, log)) {
            throw new InvalidStateException("sessionLog.error.notYours");
        }
    }

    /** The person who logged a session corrects it, or a clinician. */
    private static boolean mayCorrect(CurrentStaff staff, SessionLog log) {
        return staff.is(StaffRole.CLINICIAN) || log.getCreatedBy().equals(staff.staffId());
    }

    private NotFoundException denied(CurrentStaff staff, String action, String type, UUID id) {
        audit.recordDenied(staff, action, type, id, "not in caller's clinic, not shared, or missing");
        return new NotFoundException(type);
    }

    private static void rejectIfInvalid(List<FieldViolation> violations) {
        if (!violations.isEmpty()) {
            throw new SessionEntryRejected(violations);
        }
    }

    // --- writing ------------------------------------------------------------------------------------------------

    private SessionLogVersion newVersion(CurrentStaff staff, UUID logId, int number, TrainingPlan plan,
                                         SessionEntry entry, String reason, Instant now) {
        TrainingStep step = plan.step(entry.stepNumber()).orElseThrow();
        SwingConfiguration done = entry.asPlanned() ? step.configuration() : entry.actual().in(plan).orElseThrow();
        Double demandRatio = entry.asPlanned() ? Double.valueOf(step.demandRatio()) : plan.demandRatioOf(done);
        SessionLogVersion version = new SessionLogVersion(UUID.randomUUID(), staff.clinicId(), logId, number, plan,
                step, entry, done, demandRatio, reason, staff.staffId(), now);
        saveAppending(() -> versions.saveAndFlush(version));
        return version;
    }

    /** Two corrections of the same version at once: the second hits the unique version number and is a conflict. */
    private static void saveAppending(Runnable save) {
        try {
            save.run();
        } catch (DataIntegrityViolationException e) {
            throw new ConflictException("session log");
        }
    }

    private void raiseForSession(CurrentStaff staff, Access access, TrainingPlan plan, SessionLogVersion version) {
        AlertLimits current = limits.current(staff.clinicId());
        EpisodeSessions sessions = sessionsOf(staff, plan.episodeId());
        MorningPain morning = sessions.morning().get(version.getSessionLogId());
        LoggedSession logged = new LoggedSession(version, morning == null ? null : morning.getPain());
        for (AlertFinding finding : analysis.findingsForSession(logged, sessions.logged(), plan, current)) {
            raise(staff, access, version, finding, current);
        }
    }

    private void raise(CurrentStaff staff, Access access, SessionLogVersion session, AlertFinding finding,
                       AlertLimits current) {
        if (alerts.existsBySourceIdAndKind(finding.sourceId(), finding.kind())
                || alerts.existsBySessionLogIdAndKindAndAcknowledgedAtIsNull(session.getSessionLogId(),
                        finding.kind())) {
            return;
        }
        SessionLog log = logs.findByIdAndClinicId(session.getSessionLogId(), staff.clinicId()).orElseThrow();
        TrainingAlert alert = new TrainingAlert(UUID.randomUUID(), staff.clinicId(), access.patientId(),
                log.getEpisodeId(), log.getId(), finding.sourceId(), finding.kind(), session.getSessionDate(),
                finding.stepNumber(), finding.regressToStep(), finding.observed(), finding.threshold(),
                current.rulesVersion(), clock.instant());
        alerts.save(alert);
        audit.record(staff, "ALERT_RAISE", "TrainingAlert", alert.getId(), access.patientId(),
                "kind=" + finding.kind());
    }

    // --- reading ------------------------------------------------------------------------------------------------

    /** The latest version of each log of an episode (oldest session first) and each log's latest morning rating. */
    private EpisodeSessions sessionsOf(CurrentStaff staff, UUID episodeId) {
        Map<UUID, SessionLogVersion> latest = new LinkedHashMap<>();
        for (SessionLogVersion v : versions.findAllOfEpisode(staff.clinicId(), episodeId)) {
            latest.merge(v.getSessionLogId(), v, (a, b) -> a.getVersion() >= b.getVersion() ? a : b);
        }
        Map<UUID, MorningPain> morning = new HashMap<>();
        for (MorningPain m : mornings.findAllOfEpisode(staff.clinicId(), episodeId)) {
            morning.merge(m.getSessionLogId(), m, (a, b) -> a.getVersion() >= b.getVersion() ? a : b);
        }
        Map<UUID, SessionLog> logById = new HashMap<>();
        logs.findByClinicIdAndEpisodeId(staff.clinicId(), episodeId).forEach(l -> logById.put(l.getId(), l));
        List<SessionLogVersion> ordered = latest.values().stream()
                .sorted(Comparator.comparing(SessionLogVersion::getSessionDate)
                        .thenComparing(v -> logById.get(v.getSessionLogId()).getCreatedAt()))
                .toList();
        return new EpisodeSessions(ordered, morning, logById);
    }

    private List<SessionView> sessionViews(CurrentStaff staff, EpisodeSessions sessions) {
        List<SessionView> views = new ArrayList<>();
        for (SessionLogVersion v : sessions.latest()) {
            views.add(sessionView(staff, sessions.logs().get(v.getSessionLogId()), v,
                    sessions.morning().get(v.getSessionLogId()), analysis.sessionLoad(v), analysis.dose(v)));
        }
        java.util.Collections.reverse(views);
        return views;
    }

    private SessionView sessionView(CurrentStaff staff, SessionLog log, SessionLogVersion v, MorningPain morning,
                                    double sessionLoad, Double dose) {
        return new SessionView(log.getId(), v.getVersion(), log.getCreatedBy(), v.getSessionDate(),
                v.getPlanVersion(), v.getStepNumber(), v.isAsPlanned(), v.done(), v.planned(), v.getDemandRatio(),
                v.getDurationMin(), v.getRpe(), v.getPainBefore(), v.getPainDuring(),
                morning == null ? null : morning.getPain(),
                morning == null ? 0 : morning.getVersion(), v.getNotes(), v.getReason(), v.getRecordedAt(),
                sessionLoad, dose, mayCorrect(staff, log));
    }

    private List<AlertView> alertViews(CurrentStaff staff, UUID episodeId, String label, EpisodeSessions sessions) {
        return alerts.findByClinicIdAndEpisodeIdOrderByRaisedAtDesc(staff.clinicId(), episodeId).stream()
                .map(a -> view(a, label, sessions.superseded(a))).toList();
    }

    private boolean superseded(CurrentStaff staff, TrainingAlert alert) {
        return !currentSources(staff, alert.getSessionLogId()).contains(alert.getSourceId());
    }

    /** The ids of a log's latest version and latest morning rating: alerts from other sources were superseded. */
    private List<UUID> currentSources(CurrentStaff staff, UUID logId) {
        List<UUID> ids = new ArrayList<>();
        versions.findFirstByClinicIdAndSessionLogIdOrderByVersionDesc(staff.clinicId(), logId)
                .ifPresent(v -> ids.add(v.getId()));
        mornings.findFirstByClinicIdAndSessionLogIdOrderByVersionDesc(staff.clinicId(), logId)
                .ifPresent(m -> ids.add(m.getId()));
        return ids;
    }

    private static AlertView view(TrainingAlert a, String label, boolean superseded) {
        return new AlertView(a.getId(), a.getPatientId(), label, a.getEpisodeId(), a.getKind(), a.getSessionDate(),
                a.getStepNumber(), a.getRegressToStep(), a.getObserved(), a.getThreshold(), a.getRulesVersion(),
                a.getRaisedAt(), a.isOpen(), a.getAcknowledgedAt(), a.getAckNote(), a.getVersion(), superseded);
    }

    /**
     * The trainer's advice: with open alerts, the most conservative step among them (the latest alert on a tie);
     * otherwise, for a while after the latest alert was acknowledged, that the clinician reviewed it.
     */
    private static Advice advice(List<AlertView> alertViews, LocalDate today) {
        Optional<AlertView> strictest = alertViews.stream().filter(AlertView::open)
                .min(Comparator.comparingInt(AlertView::regressToStep));
        if (strictest.isPresent()) {
            AlertView a = strictest.get();
            return new Advice(a.kind(), a.regressToStep(), a.sessionDate(), null);
        }
        return alertViews.stream().findFirst()
                .filter(a -> a.acknowledgedAt() != null
                        && !a.sessionDate().isBefore(today.minusDays(REVIEWED_NOTICE_DAYS)))
                .map(a -> new Advice(a.kind(), a.regressToStep(), a.sessionDate(), a.acknowledgedAt()))
                .orElse(null);
    }

    /** What the caller may reach of an episode: its patient, the label they may see, the current plan if any. */
    private record Access(UUID episodeId, UUID patientId, String patientLabel, TrainingPlan plan) {
    }

    /** An episode's sessions: the latest version of each log in date order, latest morning ratings, the logs. */
    private record EpisodeSessions(List<SessionLogVersion> latest, Map<UUID, MorningPain> morning,
                                   Map<UUID, SessionLog> logs) {

        /** Each session with its latest next-morning pain, in date order. */
        List<LoggedSession> logged() {
            return latest.stream().map(v -> {
                MorningPain m = morning.get(v.getSessionLogId());
                return new LoggedSession(v, m == null ? null : m.getPain());
            }).toList();
        }

        boolean superseded(TrainingAlert alert) {
            UUID logId = alert.getSessionLogId();
            MorningPain m = morning.get(logId);
            boolean latestVersion = latest.stream().anyMatch(v -> v.getId().equals(alert.getSourceId()));
            return !latestVersion && (m == null || !m.getId().equals(alert.getSourceId()));
        }
    }
}
