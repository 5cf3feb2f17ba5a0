package org.swingclearance.audit;

import java.io.OutputStream;
import java.time.Clock;
import java.time.Instant;
import java.time.YearMonth;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import java.util.function.Consumer;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.transaction.support.TransactionTemplate;
import org.swingclearance.identity.Clinic;
import org.swingclearance.identity.ClinicRepository;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.web.ConflictException;
import org.swingclearance.web.NotFoundException;
import tools.jackson.databind.json.JsonMapper;

/**
 * The clinic manager's oversight of the audit trail: chain status and verification, checkpoints, the filtered
 * log, a patient's access log, reports and exports. Every method works on the caller's own clinic only, and
 * every look at the trail is itself audited (EHR-S FM TI.2.2#04), exports before their first byte is sent.
 */
@Service
public class AuditOversight {

    private static final int EXPORT_BATCH = 5_000;
    private static final JsonMapper JSON = JsonMapper.builder().build();

    private final AuditLog audit;
    private final AuditVerifier verifier;
    private final AuditCheckpoints checkpoints;
    private final AuditEventQueries events;
    private final AuditReportQueries reports;
    private final MonthlyActivitySummaries summaries;
    private final ClinicRepository clinics;
    private final AuditSettings settings;
    private final CheckpointSigner signer;
    private final JdbcTemplate jdbc;
    private final Clock clock;
    private final TransactionTemplate tx;

    AuditOversight(AuditLog audit, AuditVerifier verifier, AuditCheckpoints checkpoints, AuditEventQueries events,
                   AuditReportQueries reports, MonthlyActivitySummaries summaries, ClinicRepository clinics, AuditSettings settings,
                   CheckpointSigner signer, JdbcTemplate jdbc, Clock clock, PlatformTransactionManager transactions) {
        this.audit = audit;
        this.verifier = verifier;
        this.checkpoints = checkpoints;
        this.events = events;
        this.reports = reports;
        this.summaries = summaries;
        this.clinics = clinics;
        this.settings = settings;
        this.signer = signer;
        this.jdbc = jdbc;
        this.clock = clock;
        this.tx = new TransactionTemplate(transactions);
    }

    /** The chain's state without reading events, for the manager's home panel (not itself an audited look). */
    @Transactional(readOnly = true)
    public ChainStatus status(CurrentStaff manager) {
        UUID clinicId = manager.clinicId();
        long headSeq = jdbc.queryForList("select last_seq from audit_chain where chain_id = ?", Long.class, clinicId)
                .stream().findFirst().orElse(0L);
        Instant headAt = headSeq == 0 ? null : jdbc.query(
                "select occurred_at from audit_event where chain_id = ? and seq = ?",
                (rs, n) -> AuditEventQueries.instant(rs, 1), clinicId, headSeq).stream().findFirst().orElse(null);
        VerificationSummary lastVerification = jdbc.query("""
                select occurred_at, actor_name, detail from audit_event
                where clinic_id = ? and action = ? order by occurred_at desc, seq desc limit 1""",
                (rs, n) -> VerificationSummary.of(AuditEventQueries.instant(rs, 1), rs.getString(2), rs.getString(3)),
                clinicId, AuditActions.AUDIT_VERIFY).stream().findFirst().orElse(null);
        CheckpointView lastCheckpoint = checkpoints.latest(clinicId, 1).stream().findFirst().orElse(null);
        Instant earliest = jdbc.query("select min(occurred_at) from audit_event where clinic_id = ?",
                (rs, n) -> AuditEventQueries.instant(rs, 1), clinicId).stream().findFirst().orElse(null);
        return new ChainStatus(headSeq, headAt, lastVerification, lastCheckpoint, clinic(manager).getRetentionYears(),
                earliest, settings.usesDevelopmentKey(), signer.keyId());
    }

    @Transactional
    public Overview overview(CurrentStaff manager) {
        audit.record(manager, AuditActions.AUDIT_VIEW, "AuditTrail", manager.clinicId(), null, "page=overview");
        YearMonth last = YearMonth.now(clock);
        List<MonthlyActivity> twelve = summaries.months(manager.clinicId(), last.minusMonths(11), last);
        return new Overview(status(manager), checkpoints.latest(manager.clinicId(), 10), twelve);
    }

    /** Walks the own clinic's chain (outside any transaction: it may take seconds), then audits the result. */
    public VerificationReport verify(CurrentStaff manager) {
        VerificationReport report = verifier.verify(manager.clinicId());
        tx.executeWithoutResult(s -> audit.record(manager, AuditActions.AUDIT_VERIFY, "AuditTrail",
                manager.clinicId(), null, VerificationSummary.detailOf(report)));
        return report;
    }

    /** A checkpoint of the own chain's head now (if the head has none yet), audited. */
    @Transactional
    public Optional<CheckpointView> checkpointNow(CurrentStaff manager) {
        Optional<CheckpointView> made = checkpoints.checkpoint(manager.clinicId());
        audit.record(manager, AuditActions.AUDIT_CHECKPOINT, "AuditTrail", manager.clinicId(), null,
                AuditDetail.of("seq", made.map(CheckpointView::seq).orElse(null), "created", made.isPresent()));
        return made;
    }

    /** Every checkpoint of the own chain, oldest first, written as CSV or JSON; audited before writing. */
    public void exportCheckpoints(CurrentStaff manager, ExportFormat format, OutputStream out) {
        List<CheckpointView> all = tx.execute(s -> {
            audit.record(manager, AuditActions.AUDIT_EXPORT, "AuditCheckpoint", manager.clinicId(), null,
                    AuditDetail.of("format", format));
            return checkpoints.all(manager.clinicId());
        });
        if (format == ExportFormat.JSON) {
            Map<String, Object> document = new LinkedHashMap<>();
            document.put("chainId", manager.clinicId().toString());
            document.put("exportedAt", AuditReportQueries.time(clock.instant()));
            document.put("mac", "HMAC-SHA256 over length-prefixed UTF-8 fields chainId, seq, rowHash (hex), "
                    + "createdAt (epoch microseconds), keyId; each field as a 4-byte big-endian length and its bytes");
            document.put("checkpoints", all.stream().map(c -> {
                Map<String, Object> row = new LinkedHashMap<>();
                row.put("seq", c.seq());
                row.put("rowHash", c.rowHash());
                row.put("createdAt", c.createdAt().toString());
                row.put("createdAtMicros", AuditHashing.micros(c.createdAt()));
                row.put("keyId", c.keyId());
                row.put("mac", c.mac());
                return row;
            }).toList());
            JSON.writerWithDefaultPrettyPrinter().writeValue(out, document);
            return;
        }
        try (SafeCsv csv = new SafeCsv(out)) {
            csv.row(List.of("chain_id", "seq", "row_hash", "created_at", "created_at_micros", "key_id", "mac"));
            for (CheckpointView c : all) {
                csv.row(List.of(c.chainId(), c.seq(), c.rowHash(), c.createdAt(), AuditHashing.micros(c.createdAt()),
                        c.keyId(), c.mac()));
            }
        }
    }

    @Transactional
    public EventPage browse(CurrentStaff manager, AuditFilter filter, LogCursor after) {
        audit.record(manager, AuditActions.AUDIT_VIEW, "AuditTrail", manager.clinicId(), filter.patientId(),
                pageDetail("log", filter, after));
        return events.page(manager.clinicId(), filter, after, settings.pageSize());
    }

    /** Streams the whole filtered log to the sink, newest first; audited before the first row. */
    public long exportLog(CurrentStaff manager, AuditFilter filter, Consumer<EventRow> sink) {
        tx.executeWithoutResult(s -> audit.record(manager, AuditActions.AUDIT_EXPORT, "AuditTrail", manager.clinicId(),
                filter.patientId(), pageDetail("log", filter, null)));
        return events.forEach(manager.clinicId(), filter, EXPORT_BATCH, sink);
    }

    /** One event of the own clinic; another clinic's event is a 404, audited as a denied look. */
    @Transactional
    public EventDetail event(CurrentStaff manager, UUID eventId) {
        EventRow event = events.event(manager.clinicId(), eventId).orElseThrow(() -> {
            audit.recordDenied(manager, AuditActions.AUDIT_VIEW, "AuditEvent", eventId,
                    "not in caller's clinic or missing");
            return new NotFoundException("audit event");
        });
        audit.record(manager, AuditActions.AUDIT_VIEW, "AuditEvent", eventId, event.patientId(), "page=event");
        List<EventRow> same = event.objectType() == null || event.objectId() == null ? List.of()
                : events.sameObject(manager.clinicId(), event.objectType(), event.objectId(), 200);
        return new EventDetail(event, same);
    }

    /** Who opened or changed this patient's records; a patient of another clinic is a 404, audited. */
    @Transactional
    public PatientAccessLog patientLog(CurrentStaff manager, UUID patientId) {
        String code = events.patientCode(manager.clinicId(), patientId).orElseThrow(() -> {
            audit.recordDenied(manager, AuditActions.AUDIT_VIEW, "Patient", patientId,
                    "not in caller's clinic or missing");
            return new NotFoundException("patient");
        });
        audit.record(manager, AuditActions.AUDIT_VIEW, "Patient", patientId, patientId, "page=patient-access");
        AuditFilter filter = new AuditFilter(patientId, null, null, null, null, null);
        return new PatientAccessLog(patientId, code, events.accessByActor(manager.clinicId(), patientId),
                events.page(manager.clinicId(), filter, null, settings.pageSize()));
    }

    @Transactional
    public Report report(CurrentStaff manager, ReportKind kind, ReportParams params) {
        audit.record(manager, AuditActions.AUDIT_VIEW, "AuditReport", kind.slug(), null, reportDetail(params));
        return reports.report(manager.clinicId(), kind, params);
    }

    @Transactional
    public Report exportReport(CurrentStaff manager, ReportKind kind, ReportParams params) {
        audit.record(manager, AuditActions.AUDIT_EXPORT, "AuditReport", kind.slug(), null, reportDetail(params));
        return reports.report(manager.clinicId(), kind, params);
    }

    /** Sets how many years the clinic keeps its records and their audit trail. */
    @Transactional
    public void setRetention(CurrentStaff manager, int years, long expectedVersion) {
        Clinic clinic = clinic(manager);
        if (clinic.getVersion() != expectedVersion) {
            throw new ConflictException("clinic settings");
        }
        int before = clinic.getRetentionYears();
        clinic.setRetentionYears(years);
        clinics.saveAndFlush(clinic);
        audit.record(manager, AuditActions.RETENTION_UPDATE, "Clinic", manager.clinicId(), null,
                AuditDetail.of("from", before, "to", years));
    }

    @Transactional(readOnly = true)
    public long clinicVersion(CurrentStaff manager) {
        return clinic(manager).getVersion();
    }

    /** A patient of the own clinic named by id or code; empty when there is none (never another clinic's). */
    @Transactional(readOnly = true)
    public Optional<UUID> findPatient(CurrentStaff manager, String idOrCode) {
        String text = idOrCode.trim();
        UUID id = null;
        if (text.matches("(?i)[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}")) {
            id = UUID.fromString(text);
        }
        return events.patientOfClinic(manager.clinicId(), id, text);
    }

    @Transactional(readOnly = true)
    public List<StaffOption> staff(CurrentStaff manager) {
        return events.staff(manager.clinicId());
    }

    @Transactional(readOnly = true)
    public List<String> actions(CurrentStaff manager) {
        return events.actions(manager.clinicId());
    }

    private Clinic clinic(CurrentStaff manager) {
        return clinics.findById(manager.clinicId()).orElseThrow(() -> new NotFoundException("clinic"));
    }

    private static String pageDetail(String page, AuditFilter filter, LogCursor after) {
        String criteria = filter.describe();
        return AuditDetail.of("page", page, "filter", criteria, "after", after == null ? null : after.token());
    }

    private static String reportDetail(ReportParams p) {
        return AuditDetail.of("from", p.from(), "to", p.to(), "days", p.staleDays());
    }
}
