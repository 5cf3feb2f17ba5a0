package org.swingclearance.audit;

import jakarta.servlet.http.HttpServletRequest;
import java.sql.Timestamp;
import java.time.Clock;
import java.util.UUID;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Service;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.TransactionDefinition;
import org.springframework.transaction.annotation.Propagation;
import org.springframework.transaction.annotation.Transactional;
import org.springframework.transaction.support.TransactionSynchronization;
import org.springframework.transaction.support.TransactionSynchronizationManager;
import org.springframework.transaction.support.TransactionTemplate;
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
    private final TransactionTemplate ownTransaction;

    AuditLog(JdbcTemplate jdbc, Clock clock, PlatformTransactionManager transactions) {
        this.jdbc = jdbc;
        this.clock = clock;
        this.ownTransaction = new TransactionTemplate(transactions);
        this.ownTransaction.setPropagationBehavior(TransactionDefinition.PROPAGATION_REQUIRES_NEW);
    }

    /** A successful read or change by a staff member, inside the caller's transaction. */
    @Transactional(propagation = Propagation.MANDATORY)
    public void record(CurrentStaff actor, String action, String objectType, Object objectId, UUID patientId,
                       String detail) {
        append(new Entry(actor.clinicId(), actor.staffId(), actor.email(), actor.role().name(), action, objectType,
                text(objectId), patientId, AuditOutcome.SUCCESS, currentClientAddress(), detail));
    }

    /** A refused attempt (foreign or unshared record, missing role); kept even though the request fails. */
    public void recordDenied(CurrentStaff actor, String action, String objectType, Object objectId, String detail) {
        appendIndependently(new Entry(actor.clinicId(), actor.staffId(), actor.email(), actor.role().name(), action,
                objectType, text(objectId), null, AuditOutcome.DENIED, currentClientAddress(), detail));
    }

    /** An event with no signed-in actor, such as a failed sign-in; {@code clinicId} may be null. */
    public void recordAnonymous(UUID clinicId, String actorName, String action, AuditOutcome outcome,
                                String clientAddress, String detail) {
        appendIndependently(new Entry(clinicId, null, actorName, null, action, null, null, null, outcome,
                clientAddress, detail));
    }

    /** A sign-in or sign-out of a known staff member, in its own transaction. */
    public void recordSession(CurrentStaff actor, String action, AuditOutcome outcome, String clientAddress) {
        appendIndependently(new Entry(actor.clinicId(), actor.staffId(), actor.email(), actor.role().name(), action,
                "StaffAccount", actor.staffId().toString(), null, outcome, clientAddress, null));
    }

    /**
     * Writes in a transaction of its own, so the row survives the caller's rollback. If the caller's transaction
     * already holds this chain's head lock (it recorded an event first), a second connection waiting for that
     * lock would wait for ever on the thread that holds it; the row is then written right after the caller's
     * transaction ends, whether it commits or rolls back.
     */
    private void appendIndependently(Entry entry) {
        if (HeldChains.holds(entry.chainId())) {
            TransactionSynchronizationManager.registerSynchronization(new TransactionSynchronization() {
                @Override
                public void afterCompletion(int status) {
                    ownTransaction.executeWithoutResult(s -> append(entry));
                }
            });
            return;
        }
        ownTransaction.executeWithoutResult(s -> append(entry));
    }

    /**
     * Two round trips: the first locks the chain head (creating it at the genesis hash for a clinic's first
     * event), the second inserts the row and moves the head in one statement.
     */
    private void append(Entry e) {
        UUID chainId = e.chainId();
        ChainHead head = jdbc.queryForObject("""
                insert into audit_chain (chain_id, last_seq, last_hash) values (?, 0, ?)
                on conflict (chain_id) do update set last_seq = audit_chain.last_seq
                returning last_seq, last_hash""",
                (rs, n) -> new ChainHead(rs.getLong(1), rs.getBytes(2)), chainId, AuditHashing.GENESIS);
        HeldChains.add(chainId);
        long seq = head.lastSeq() + 1;
        AuditRecord record = new AuditRecord(chainId, seq, UUID.randomUUID(),
                AuditHashing.toStoredPrecision(clock.instant()), e.clinicId(), e.actorId(), clip(e.actorName(), 254),
                e.actorRole(), e.action(), e.objectType(), clip(e.objectId(), 80), e.patientId(), e.outcome(),
                clip(e.clientAddress(), 64), clip(RequestIds.current(), 80), clip(e.detail(), 2000), head.lastHash());
        byte[] rowHash = AuditHashing.hash(record);
        jdbc.update("""
                with appended as (
                    insert into audit_event (chain_id, seq, event_id, occurred_at, clinic_id, actor_id, actor_name,
                        actor_role, action, object_type, object_id, patient_id, outcome, client_address, request_id,
                        detail, prev_hash, row_hash)
                    values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)
                    returning chain_id, seq, row_hash)
                update audit_chain c set last_seq = a.seq, last_hash = a.row_hash
                from appended a where c.chain_id = a.chain_id""",
                record.chainId(), record.seq(), record.eventId(), Timestamp.from(record.occurredAt()),
                record.clinicId(), record.actorId(), record.actorName(), record.actorRole(), record.action(),
                record.objectType(), record.objectId(), record.patientId(), record.outcome().name(),
                record.clientAddress(), record.requestId(), record.detail(), record.prevHash(), rowHash);
    }

    private static String currentClientAddress() {
        if (RequestContextHolder.getRequestAttributes() instanceof ServletRequestAttributes attrs) {
            HttpServletRequest request = attrs.getRequest();
            return request.getRemoteAddr();
        }
        return null;
    }

    private static String text(Object value) {
        return value == null ? null : value.toString();
    }

    private static String clip(String value, int max) {
        return value == null || value.length() <= max ? value : value.substring(0, max);
    }

    /** What the caller asked to record, before it gets its place in the chain. */
    private record Entry(UUID clinicId, UUID actorId, String actorName, String actorRole, String action,
                         String objectType, String objectId, UUID patientId, AuditOutcome outcome,
                         String clientAddress, String detail) {

        UUID chainId() {
            return clinicId == null ? SYSTEM_CHAIN : clinicId;
        }
    }

    private record ChainHead(long lastSeq, byte[] lastHash) {
    }

    /**
     * The chains whose head the current transaction has locked. Bound to the transaction and unbound while it
     * is suspended, so a nested REQUIRES_NEW transaction sees only its own locks.
     */
    private static final class HeldChains implements TransactionSynchronization {

        private static final Object KEY = HeldChains.class;
        private final java.util.Set<UUID> chains = new java.util.HashSet<>();

        static boolean holds(UUID chainId) {
            return TransactionSynchronizationManager.getResource(KEY) instanceof HeldChains held
                    && held.chains.contains(chainId);
        }

        static void add(UUID chainId) {
            if (!TransactionSynchronizationManager.isSynchronizationActive()) {
                return;
            }
            HeldChains held = (HeldChains) TransactionSynchronizationManager.getResource(KEY);
            if (held == null) {
                held = new HeldChains();
                TransactionSynchronizationManager.bindResource(KEY, held);
                TransactionSynchronizationManager.registerSynchronization(held);
            }
            held.chains.add(chainId);
        }

        @Override
        public void suspend() {
            TransactionSynchronizationManager.unbindResourceIfPossible(KEY);
        }

        @Override
        public void resume() {
            TransactionSynchronizationManager.bindResource(KEY, this);
        }

        @Override
        public void afterCompletion(int status) {
            TransactionSynchronizationManager.unbindResourceIfPossible(KEY);
        }
    }
}
