package org.swingclearance.audit;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Timestamp;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import java.util.function.Consumer;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Repository;

/**
 * The read side of the audit trail for the manager's pages. Every query is scoped by the clinic and ordered
 * by (occurred_at DESC, seq DESC) with keyset paging, which the indexes of V21 serve without sorting.
 */
@Repository
class AuditEventQueries {

    private static final String COLUMNS = """
            e.seq, e.event_id, e.occurred_at, e.actor_id, e.actor_name, s.display_name, e.actor_role, e.action,
            e.object_type, e.object_id, e.patient_id, p.code, e.outcome, e.client_address, e.request_id, e.detail,
            e.prev_hash, e.row_hash
            from audit_event e
            left join staff_account s on s.id = e.actor_id and s.clinic_id = e.clinic_id
            left join patient p on p.id = e.patient_id and p.clinic_id = e.clinic_id
            """;

    private final JdbcTemplate jdbc;

    AuditEventQueries(JdbcTemplate jdbc) {
        this.jdbc = jdbc;
    }

    /** One page of the filtered log after the cursor (or from the newest event). */
    EventPage page(UUID clinicId, AuditFilter filter, LogCursor after, int size) {
        List<EventRow> rows = query(clinicId, filter, after, size + 1);
        if (rows.size() <= size) {
            return new EventPage(rows, null);
        }
        List<EventRow> page = rows.subList(0, size);
        return new EventPage(List.copyOf(page), page.get(size - 1).cursor());
    }

    /** Every matching row, newest first, fetched in pages so an export of a million rows needs little memory. */
    long forEach(UUID clinicId, AuditFilter filter, int batch, Consumer<EventRow> sink) {
        long count = 0;
        LogCursor after = null;
        while (true) {
            List<EventRow> rows = query(clinicId, filter, after, batch);
            rows.forEach(sink);
            count += rows.size();
            if (rows.size() < batch) {
                return count;
            }
            after = rows.get(rows.size() - 1).cursor();
        }
    }

    Optional<EventRow> event(UUID clinicId, UUID eventId) {
        return jdbc.query("select " + COLUMNS + " where e.clinic_id = ? and e.event_id = ?", AuditEventQueries::row,
                clinicId, eventId).stream().findFirst();
    }

    /** The other events about the same record (its creation, signing, shares), oldest first. */
    List<EventRow> sameObject(UUID clinicId, String objectType, String objectId, int limit) {
        return jdbc.query("select " + COLUMNS + """
                 where e.clinic_id = ? and e.object_type = ? and e.object_id = ?
                order by e.occurred_at, e.seq limit ?""", AuditEventQueries::row, clinicId, objectType, objectId,
                limit);
    }

    /** Who touched a patient's records: one line per account, with counts and first and last time. */
    List<PatientAccess> accessByActor(UUID clinicId, UUID patientId) {
        return jdbc.query("""
                select e.actor_id, coalesce(s.display_name, max(e.actor_name)), max(e.actor_role), count(*),
                       count(*) filter (where e.action like '%READ%' or e.action like '%VIEW%'),
                       min(e.occurred_at), max(e.occurred_at)
                from audit_event e
                left join staff_account s on s.id = e.actor_id and s.clinic_id = e.clinic_id
                where e.clinic_id = ? and e.patient_id = ?
                group by e.actor_id, s.display_name
                order by max(e.occurred_at) desc""",
                (rs, n) -> new PatientAccess(rs.getObject(1, UUID.class), rs.getString(2), rs.getString(3),
                        rs.getLong(4), rs.getLong(5), instant(rs, 6), instant(rs, 7)),
                clinicId, patientId);
    }

    /** The distinct actions of a clinic, by skipping through the action index (one probe per action). */
    List<String> actions(UUID clinicId) {
        return jdbc.queryForList("""
                with recursive a(action) as (
                    select min(action) from audit_event where clinic_id = ?
                    union all
                    select (select min(action) from audit_event where clinic_id = ? and action > a.action)
                    from a where a.action is not null)
                select action from a where action is not null""", String.class, clinicId, clinicId);
    }

    /** Events per month (UTC) since {@code from}: all, about a patient, denied, failed. */
    List<MonthlyActivity> monthlyActivity(UUID clinicId, Instant from, Instant until) {
        return jdbc.query("""
                select to_char(date_trunc('month', occurred_at at time zone 'UTC'), 'YYYY-MM') as month, count(*),
                       count(*) filter (where patient_id is not null),
                       count(*) filter (where outcome = 'DENIED'), count(*) filter (where outcome = 'FAILED')
                from audit_event where clinic_id = ? and occurred_at >= ? and occurred_at < ?
                group by 1 order by 1""",
                (rs, n) -> new MonthlyActivity(rs.getString(1), rs.getLong(2), rs.getLong(3), rs.getLong(4),
                        rs.getLong(5)),
                clinicId, Timestamp.from(from), Timestamp.from(until));
    }

    /** A patient of the clinic by id or by code (case-insensitive), for the patient filter. */
    Optional<UUID> patientOfClinic(UUID clinicId, UUID id, String code) {
        List<UUID> found = id != null
                ? jdbc.queryForList("select id from patient where clinic_id = ? and id = ?", UUID.class, clinicId, id)
                : jdbc.queryForList("select id from patient where clinic_id = ? and lower(code) = lower(?)", UUID.class,
                        clinicId, code);
        return found.stream().findFirst();
    }

    Optional<String> patientCode(UUID clinicId, UUID patientId) {
        return jdbc.queryForList("select code from patient where clinic_id = ? and id = ?", String.class, clinicId,
                patientId).stream().findFirst();
    }

    /** The clinic's accounts for the actor filter: id, name and role. */
    List<StaffOption> staff(UUID clinicId) {
        return jdbc.query("select id, display_name, role from staff_account where clinic_id = ? order by display_name",
                (rs, n) -> new StaffOption(rs.getObject(1, UUID.class), rs.getString(2), rs.getString(3)), clinicId);
    }

    private List<EventRow> query(UUID clinicId, AuditFilter f, LogCursor after, int limit) {
        StringBuilder sql = new StringBuilder("select ").append(COLUMNS).append(" where e.clinic_id = ?");
        List<Object> args = new ArrayList<>();
        args.add(clinicId);
        if (f.patientId() != null) {
            sql.append(" and e.patient_id = ?");
            args.add(f.patientId());
        }
        if (f.actorId() != null) {
            sql.append(" and e.actor_id = ?");
            args.add(f.actorId());
        }
        if (f.action() != null) {
            sql.append(" and e.action = ?");
            args.add(f.action());
        }
        if (f.outcome() == AuditOutcome.SUCCESS) {
            sql.append(" and e.outcome = 'SUCCESS'");
        } else if (f.outcome() != null) {
            // Spelled like the partial index's predicate so the planner can use it.
            sql.append(" and e.outcome <> 'SUCCESS' and e.outcome = ?");
            args.add(f.outcome().name());
        }
        if (f.from() != null) {
            sql.append(" and e.occurred_at >= ?");
            args.add(Timestamp.from(f.from()));
        }
        if (f.until() != null) {
            sql.append(" and e.occurred_at < ?");
            args.add(Timestamp.from(f.until()));
        }
        if (after != null) {
            sql.append(" and (e.occurred_at, e.seq) < (?, ?)");
            args.add(Timestamp.from(after.occurredAt()));
            args.add(after.seq());
        }
        sql.append(" order by e.occurred_at desc, e.seq desc limit ?");
        args.add(limit);
        return jdbc.query(sql.toString(), AuditEventQueries::row, args.toArray());
    }

    private static EventRow row(ResultSet rs, int n) throws SQLException {
        return new EventRow(rs.getLong(1), rs.getObject(2, UUID.class), instant(rs, 3), rs.getObject(4, UUID.class),
                rs.getString(5), rs.getString(6), rs.getString(7), rs.getString(8), rs.getString(9), rs.getString(10),
                rs.getObject(11, UUID.class), rs.getString(12), AuditOutcome.valueOf(rs.getString(13)),
                rs.getString(14), rs.getString(15), rs.getString(16), AuditHashing.hex(rs.getBytes(17)),
                AuditHashing.hex(rs.getBytes(18)));
    }

    static Instant instant(ResultSet rs, int column) throws SQLException {
        OffsetDateTime value = rs.getObject(column, OffsetDateTime.class);
        return value == null ? null : value.toInstant();
    }
}
