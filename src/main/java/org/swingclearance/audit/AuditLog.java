package org.swingclearance.audit;

import jakarta.servlet.http.HttpServletRequest;
import java.sql.Timestamp;
import java.time.Clock;
import java.util.Map;
import java.util.UUID;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Propagation;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.web.context.request.RequestContextHolder;
import org.springframework.web.context.request.ServletRequestAttributes;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.web.RequestIds;

/**
 * Appends events to a clinic's hash chain. Writers of one clinic are serialised by a row lock on the chain
 * head, so concurrent requests can never fork the chain; other clinics' writers do not wait.
 * {@link #record} joins the caller's transaction (a change that cannot be audited does not happen);
 * denials and sign-in events are written in their own transaction so they survive the caller's rollback.
 */
@Service
public class AuditLog {

    /** The chain of installation-wide events that belong to no clinic (a failed sign-in for an unknown name). */
    public static final UUID SYSTEM_CHAIN = new UUID(0L, 0L);

    private final JdbcTemplate jdbc;
    private final Clock clock;

    AuditLog(JdbcTemplate jdbc, Clock clock) {
        this.jdbc = jdbc;
        this.clock = clock;
    }

    /** A successful read or change by a staff member, inside the caller's transaction. */
    @Transactional(propagation = Propagation.MANDATORY)
    public void record(CurrentStaff actor, String action, String objectType, Object objectId, UUID patientId,
                       String detail) {
        append(actor.clinicId(), actor, action, objectType, objectId, patientId, AuditOutcome.SUCCESS, detail);
    }

    /** A refused attempt (foreign or unshared record, missing role); kept even though the request fails. */
    @Transactional(propagation = Propagation.REQUIRES_NEW)
    public void recordDenied(CurrentStaff actor, String action, String objectType, Object objectId, String detail) {
        append(actor.clinicId(), actor, action, objectType, objectId, null, AuditOutcome.DENIED, detail);
    }

    /** An event with no signed-in actor, such as a failed sign-in; {@code clinicId} may be null. */
    @Transactional(propagation = Propagation.REQUIRES_NEW)
    public void recordAnonymous(UUID clinicId, String actorName, String action, AuditOutcome outcome,
                                String clientAddress, String detail) {
        append(clinicId, null, actorName, null, action, null, null, null, outcome, clientAddress, detail);
    }

    /** A sign-in or sign-out of a known staff member, in its own transaction. */
    @Transactional(propagation = Propagation.REQUIRES_NEW)
    public void recordSession(CurrentStaff actor, String action, AuditOutcome outcome, String clientAddress) {
        append(actor.clinicId(), actor.staffId(), actor.email(), actor.role().name(), action, "StaffAccount",
                actor.staffId().toString(), null, outcome, clientAddress, null);
    }

    private void append(UUID clinicId, CurrentStaff actor, String action, String objectType, Object objectId,
                        UUID patientId, AuditOutcome outcome, String detail) {
        append(clinicId, actor.staffId(), actor.email(), actor.role().name(), action, objectType,
                objectId == null ? null : objectId.toString(), patientId, outcome, currentClientAddress(), detail);
    }

    private void append(UUID clinicId, UUID actorId, String actorName, String actorRole, String action,
                        String objectType, String objectId, UUID patientId, AuditOutcome outcome,
                        String clientAddress, String detail) {
        UUID chainId = clinicId == null ? SYSTEM_CHAIN : clinicId;
        jdbc.update("insert into audit_chain (chain_id, last_seq, last_hash) values (?, 0, ?) on conflict do nothing",
                chainId, AuditHashing.GENESIS);
        Map<String, Object> head = jdbc.queryForMap(
                "select last_seq, last_hash from audit_chain where chain_id = ? for update", chainId);
        long seq = ((Number) head.get("last_seq")).longValue() + 1;
        byte[] prevHash = (byte[]) head.get("last_hash");
        AuditRecord record = new AuditRecord(chainId, seq, UUID.randomUUID(),
                AuditHashing.toStoredPrecision(clock.instant()), clinicId, actorId, clip(actorName, 254), actorRole,
                action, objectType, clip(objectId, 80), patientId, outcome, clip(clientAddress, 64),
                RequestIds.current(), clip(detail, 2000), prevHash);
        byte[] rowHash = AuditHashing.hash(record);
        jdbc.update("""
                insert into audit_event (chain_id, seq, event_id, occurred_at, clinic_id, actor_id, actor_name,
                    actor_role, action, object_type, object_id, patient_id, outcome, client_address, request_id,
                    detail, prev_hash, row_hash)
                values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)""",
                record.chainId(), record.seq(), record.eventId(), Timestamp.from(record.occurredAt()),
                record.clinicId(), record.actorId(), record.actorName(), record.actorRole(), record.action(),
                record.objectType(), record.objectId(), record.patientId(), record.outcome().name(),
                record.clientAddress(), record.requestId(), record.detail(), record.prevHash(), rowHash);
        jdbc.update("update audit_chain set last_seq = ?, last_hash = ? where chain_id = ?", seq, rowHash, chainId);
    }

    private static String currentClientAddress() {
        if (RequestContextHolder.getRequestAttributes() instanceof ServletRequestAttributes attrs) {
            HttpServletRequest request = attrs.getRequest();
            return request.getRemoteAddr();
        }
        return null;
    }

    private static String clip(String value, int max) {
        return value == null || value.length() <= max ? value : value.substring(0, max);
    }
}
