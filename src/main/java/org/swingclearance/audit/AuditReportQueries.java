package org.swingclearance.audit;

import java.sql.Timestamp;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.UUID;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Repository;

/**
 * Computes the manager's reports from the audit events named in {@link AuditActions}. Only successful events
 * count; every query is scoped by the clinic. Times are shown in UTC, ISO-8601, to the second.
 */
@Repository
class AuditReportQueries {

    private final JdbcTemplate jdbc;
    private final AuditEventQueries events;

    AuditReportQueries(JdbcTemplate jdbc, AuditEventQueries events) {
        this.jdbc = jdbc;
        this.events = events;
    }

    Report report(UUID clinicId, ReportKind kind, ReportParams params) {
        return switch (kind) {
            case SCREENINGS_PER_CLINICIAN -> screeningsPerClinician(clinicId, params);
            case BAND_OVERRIDES -> bandOverrides(clinicId, params);
            case OVERDUE_RESCREENS -> overdueRescreens(clinicId, params);
            case STALE_DRAFTS -> staleDrafts(clinicId, params);
            case SHARES_PER_TRAINER -> sharesPerTrainer(clinicId, params);
            case ACTIVITY_PER_MONTH -> activityPerMonth(clinicId, params);
        };
    }

    private Report screeningsPerClinician(UUID clinicId, ReportParams p) {
        List<List<String>> rows = jdbc.query("""
                select to_char(date_trunc('month', e.occurred_at at time zone 'UTC'), 'YYYY-MM'),
                       coalesce(s.display_name, max(e.actor_name)), max(e.actor_role),
                       count(*) filter (where e.action = ?), count(*) filter (where e.action = ?)
                from audit_event e
                left join staff_account s on s.id = e.actor_id and s.clinic_id = e.clinic_id
                where e.clinic_id = ? and e.action in (?, ?) and e.outcome = 'SUCCESS'
                  and e.occurred_at >= ? and e.occurred_at < ?
                group by 1, e.actor_id, s.display_name
                order by 1, 2""",
                (rs, n) -> List.of(rs.getString(1), rs.getString(2), nz(rs.getString(3)),
                        Long.toString(rs.getLong(4)), Long.toString(rs.getLong(5))),
                AuditActions.SCREENING_SIGN, AuditActions.SCREENING_CREATE, clinicId, AuditActions.SCREENING_SIGN,
                AuditActions.SCREENING_CREATE, start(p.from()), endOf(p.to()));
        return new Report(ReportKind.SCREENINGS_PER_CLINICIAN, List.of("audit.col.month", "audit.col.clinician",
                "audit.col.role", "audit.col.signed", "audit.col.started"), rows, p);
    }

    private Report bandOverrides(UUID clinicId, ReportParams p) {
        List<List<String>> rows = jdbc.query("""
                select e.occurred_at, coalesce(s.display_name, e.actor_name), coalesce(pt.code, e.patient_id::text),
                       e.object_id, e.detail
                from audit_event e
                left join staff_account s on s.id = e.actor_id and s.clinic_id = e.clinic_id
                left join patient pt on pt.id = e.patient_id and pt.clinic_id = e.clinic_id
                where e.clinic_id = ? and e.action = ? and e.outcome = 'SUCCESS'
                  and e.occurred_at >= ? and e.occurred_at < ?
                order by e.occurred_at, e.seq""",
                (rs, n) -> {
                    Map<String, String> detail = AuditDetail.parse(rs.getString(5));
                    return List.of(time(AuditEventQueries.instant(rs, 1)), nz(rs.getString(2)), nz(rs.getString(3)),
                            nz(rs.getString(4)), nz(detail.get("region")), nz(detail.get("reason")));
                },
                clinicId, AuditActions.BAND_OVERRIDE, start(p.from()), endOf(p.to()));
        return new Report(ReportKind.BAND_OVERRIDES, List.of("audit.col.time", "audit.col.clinician",
                "audit.col.patient", "audit.col.screening", "audit.col.region", "audit.col.reason"), rows, p);
    }

    /**
     * A plan's re-screen gate is overdue when its date has passed and no screening of the same episode (or, for
     * events without an episode, of the same patient) was signed after the plan was issued. Only each episode's
     * latest issued plan counts: a newer plan replaces the gate of the older one.
     */
    private Report overdueRescreens(UUID clinicId, ReportParams p) {
        Map<String, PlanIssue> latestPlan = new HashMap<>();
        jdbc.query("""
                select e.object_id, e.patient_id, coalesce(pt.code, e.patient_id::text), e.detail, e.occurred_at,
                       coalesce(s.display_name, e.actor_name)
                from audit_event e
                left join staff_account s on s.id = e.actor_id and s.clinic_id = e.clinic_id
                left join patient pt on pt.id = e.patient_id and pt.clinic_id = e.clinic_id
                where e.clinic_id = ? and e.action = ? and e.outcome = 'SUCCESS'
                order by e.occurred_at, e.seq""",
                rs -> {
                    Map<String, String> detail = AuditDetail.parse(rs.getString(4));
                    UUID patientId = rs.getObject(2, UUID.class);
                    String episode = detail.get("episode");
                    PlanIssue issue = new PlanIssue(rs.getString(1), patientId, rs.getString(3), episode,
                            date(detail.get("rescreenDue")), AuditEventQueries.instant(rs, 5), rs.getString(6));
                    latestPlan.put(episode != null ? "e:" + episode : "p:" + patientId, issue);
                }, clinicId, AuditActions.PLAN_ISSUE);
        Map<String, Instant> lastSigned = new HashMap<>();
        jdbc.query("""
                select e.patient_id, e.detail, e.occurred_at from audit_event e
                where e.clinic_id = ? and e.action = ? and e.outcome = 'SUCCESS'""",
                rs -> {
                    String episode = AuditDetail.parse(rs.getString(2)).get("episode");
                    Instant at = AuditEventQueries.instant(rs, 3);
                    if (episode != null) {
                        lastSigned.merge("e:" + episode, at, AuditReportQueries::later);
                    }
                    lastSigned.merge("p:" + rs.getObject(1, UUID.class), at, AuditReportQueries::later);
                }, clinicId, AuditActions.SCREENING_SIGN);
        List<PlanIssue> overdue = new ArrayList<>();
        for (PlanIssue plan : latestPlan.values()) {
            if (plan.rescreenDue() == null || !plan.rescreenDue().isBefore(p.today())) {
                continue;
            }
            Instant signed = plan.episode() != null ? lastSigned.get("e:" + plan.episode())
                    : lastSigned.get("p:" + plan.patientId());
            if (signed == null || signed.isBefore(plan.issuedAt())) {
                overdue.add(plan);
            }
        }
        overdue.sort((a, b) -> a.rescreenDue().compareTo(b.rescreenDue()));
        List<List<String>> rows = overdue.stream().map(plan -> List.of(nz(plan.patientCode()), nz(plan.episode()),
                nz(plan.planId()), time(plan.issuedAt()), plan.rescreenDue().toString(),
                Long.toString(ChronoUnit.DAYS.between(plan.rescreenDue(), p.today())), nz(plan.issuedBy()))).toList();
        return new Report(ReportKind.OVERDUE_RESCREENS, List.of("audit.col.patient", "audit.col.episode",
                "audit.col.plan", "audit.col.issuedAt", "audit.col.rescreenDue", "audit.col.daysOverdue",
                "audit.col.issuedBy"), rows, p);
    }

    /**
     * Drafts (a new screening or an amendment of a signed one) opened more than {@code staleDays} days before today
     * and not signed nor discarded since.
     */
    private Report staleDrafts(UUID clinicId, ReportParams p) {
        Instant before = p.today().minusDays(p.staleDays()).atStartOfDay(ZoneOffset.UTC).toInstant();
        List<List<String>> rows = jdbc.query("""
                select c.occurred_at, coalesce(s.display_name, c.actor_name), coalesce(pt.code, c.patient_id::text),
                       c.object_id
                from audit_event c
                left join staff_account s on s.id = c.actor_id and s.clinic_id = c.clinic_id
                left join patient pt on pt.id = c.patient_id and pt.clinic_id = c.clinic_id
                where c.clinic_id = ? and c.action in (?, ?) and c.outcome = 'SUCCESS' and c.occurred_at < ?
                  and not exists (
                      select 1 from audit_event d
                      where d.clinic_id = c.clinic_id and d.object_type = c.object_type and d.object_id = c.object_id
                        and d.action in (?, ?) and d.outcome = 'SUCCESS' and (d.occurred_at, d.seq) > (c.occurred_at, c.seq))
                order by c.occurred_at, c.seq""",
                (rs, n) -> {
                    Instant started = AuditEventQueries.instant(rs, 1);
                    long days = ChronoUnit.DAYS.between(started.atZone(ZoneOffset.UTC).toLocalDate(), p.today());
                    return List.of(time(started), nz(rs.getString(2)), nz(rs.getString(3)), nz(rs.getString(4)),
                            Long.toString(days));
                },
                clinicId, AuditActions.SCREENING_CREATE, AuditActions.SCREENING_AMEND, Timestamp.from(before),
                AuditActions.SCREENING_SIGN,
                AuditActions.SCREENING_DISCARD);
        return new Report(ReportKind.STALE_DRAFTS, List.of("audit.col.startedAt", "audit.col.clinician",
                "audit.col.patient", "audit.col.screening", "audit.col.daysOpen"), rows, p);
    }

    /**
     * Shares made and withdrawn per trainer within the period, and the shares active today from the whole history
     * (a share is active from its PLAN_SHARE until a PLAN_UNSHARE of the same plan and trainer).
     */
    private Report sharesPerTrainer(UUID clinicId, ReportParams p) {
        Instant from = start(p.from()).toInstant();
        Instant until = endOf(p.to()).toInstant();
        Map<String, TrainerShares> byTrainer = new TreeMap<>();
        jdbc.query("""
                select e.action, e.object_id, e.patient_id, e.detail, e.occurred_at from audit_event e
                where e.clinic_id = ? and e.action in (?, ?) and e.outcome = 'SUCCESS'
                order by e.occurred_at, e.seq""",
                rs -> {
                    String trainer = AuditDetail.parse(rs.getString(4)).get("trainer");
                    if (trainer == null) {
                        return;
                    }
                    TrainerShares shares = byTrainer.computeIfAbsent(trainer, t -> new TrainerShares());
                    Instant at = AuditEventQueries.instant(rs, 5);
                    boolean inPeriod = !at.isBefore(from) && at.isBefore(until);
                    String plan = rs.getString(2);
                    if (AuditActions.PLAN_SHARE.equals(rs.getString(1))) {
                        shares.made += inPeriod ? 1 : 0;
                        shares.active.put(plan, rs.getObject(3, UUID.class));
                    } else {
                        shares.withdrawn += inPeriod ? 1 : 0;
                        shares.active.remove(plan);
                    }
                }, clinicId, AuditActions.PLAN_SHARE, AuditActions.PLAN_UNSHARE);
        Map<String, String> names = new HashMap<>();
        jdbc.query("select id, display_name from staff_account where clinic_id = ?",
                rs -> {
                    names.put(rs.getString(1), rs.getString(2));
                }, clinicId);
        List<List<String>> rows = new ArrayList<>();
        byTrainer.forEach((trainer, shares) -> {
            Set<UUID> patients = new LinkedHashSet<>(shares.active.values());
            rows.add(List.of(names.getOrDefault(trainer, trainer), Long.toString(shares.made),
                    Long.toString(shares.withdrawn), Integer.toString(shares.active.size()),
                    Integer.toString(patients.size())));
        });
        rows.sort((a, b) -> a.get(0).compareToIgnoreCase(b.get(0)));
        return new Report(ReportKind.SHARES_PER_TRAINER, List.of("audit.col.trainer", "audit.col.sharesMade",
                "audit.col.sharesWithdrawn", "audit.col.sharesActive", "audit.col.patientsActive"), rows, p);
    }

    private Report activityPerMonth(UUID clinicId, ReportParams p) {
        List<List<String>> rows = events.monthlyActivity(clinicId, start(p.from()).toInstant(),
                        endOf(p.to()).toInstant()).stream()
                .map(m -> List.of(m.month(), Long.toString(m.events()), Long.toString(m.aboutPatients()),
                        Long.toString(m.denied()), Long.toString(m.failed())))
                .toList();
        return new Report(ReportKind.ACTIVITY_PER_MONTH, List.of("audit.col.month", "audit.col.events",
                "audit.col.aboutPatients", "audit.col.denied", "audit.col.failed"), rows, p);
    }

    private static Timestamp start(LocalDate day) {
        return Timestamp.from(day.atStartOfDay(ZoneOffset.UTC).toInstant());
    }

    private static Timestamp endOf(LocalDate day) {
        return Timestamp.from(day.plusDays(1).atStartOfDay(ZoneOffset.UTC).toInstant());
    }

    static String time(Instant at) {
        return at == null ? "" : at.truncatedTo(ChronoUnit.SECONDS).toString();
    }

    private static String nz(String text) {
        return text == null ? "" : text;
    }

    private static LocalDate date(String iso) {
        if (iso == null) {
            return null;
        }
        try {
            return LocalDate.parse(iso);
        } catch (DateTimeParseException e) {
            return null;
        }
    }

    private static Instant later(Instant a, Instant b) {
        return a.isAfter(b) ? a : b;
    }

    private record PlanIssue(String planId, UUID patientId, String patientCode, String episode, LocalDate rescreenDue,
                             Instant issuedAt, String issuedBy) {
    }

    /** Counters of one trainer while the share events are replayed. */
    private static final class TrainerShares {
        private long made;
        private long withdrawn;
        private final Map<String, UUID> active = new HashMap<>();
    }
}
