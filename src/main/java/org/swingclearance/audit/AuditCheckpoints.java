package org.swingclearance.audit;

import java.sql.Timestamp;
import java.time.Clock;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.UUID;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.scheduling.annotation.Scheduled;
import org.springframework.stereotype.Component;
import org.springframework.transaction.annotation.Propagation;
import org.springframework.transaction.annotation.Transactional;

/**
 * Signed checkpoints of the chain heads (security-audit-interop.md B.2 step 6). A daily job fixes the head of
 * every chain that moved since its last checkpoint; with several application nodes only the one that gets the
 * database's advisory lock writes, the others find the lock taken and skip the run.
 */
@Component
public class AuditCheckpoints {

    /** The advisory lock of the checkpoint job; any fixed number unique within the application. */
    static final long JOB_LOCK = 0x5743_4150_4348_4b01L;

    private static final Logger LOG = LoggerFactory.getLogger(AuditCheckpoints.class);

    private final JdbcTemplate jdbc;
    private final CheckpointSigner signer;
    private final Clock clock;

    AuditCheckpoints(JdbcTemplate jdbc, CheckpointSigner signer, Clock clock, AuditSettings settings) {
        this.jdbc = jdbc;
        this.signer = signer;
        this.clock = clock;
        if (settings.usesDevelopmentKey()) {
            LOG.warn("Audit checkpoints are signed with the development key: set clearance.audit.checkpoint-key "
                    + "(environment variable CLEARANCE_AUDIT_CHECKPOINT_KEY) to a secret of this installation");
        }
    }

    /** The daily run: returns how many checkpoints it wrote, or -1 if another node holds the job's lock. */
    @Scheduled(cron = "${clearance.audit.checkpoint-cron:0 5 0 * * *}", zone = "UTC")
    @Transactional
    public int checkpointAllChains() {
        Boolean locked = jdbc.queryForObject("select pg_try_advisory_xact_lock(?)", Boolean.class, JOB_LOCK);
        if (!Boolean.TRUE.equals(locked)) {
            LOG.info("Audit checkpoint run skipped: another node holds the lock");
            return -1;
        }
        List<UUID> moved = jdbc.queryForList("""
                select c.chain_id from audit_chain c
                where c.last_seq > 0 and not exists (
                    select 1 from audit_checkpoint k where k.chain_id = c.chain_id and k.seq >= c.last_seq)
                order by c.chain_id""", UUID.class);
        int written = 0;
        for (UUID chainId : moved) {
            if (write(chainId).isPresent()) {
                written++;
            }
        }
        LOG.info("Audit checkpoint run wrote {} checkpoint(s)", written);
        return written;
    }

    /** A checkpoint of one chain's head now, unless the head already has one; joins the caller's transaction. */
    @Transactional(propagation = Propagation.MANDATORY)
    public Optional<CheckpointView> checkpoint(UUID chainId) {
        return write(chainId);
    }

    @Transactional(readOnly = true)
    public List<CheckpointView> latest(UUID chainId, int limit) {
        return jdbc.query("""
                select chain_id, seq, row_hash, created_at, key_id, mac from audit_checkpoint
                where chain_id = ? order by seq desc limit ?""", AuditCheckpoints::view, chainId, limit);
    }

    /** Every checkpoint of a chain, oldest first, for the export kept outside the database. */
    @Transactional(readOnly = true)
    public List<CheckpointView> all(UUID chainId) {
        return jdbc.query("""
                select chain_id, seq, row_hash, created_at, key_id, mac from audit_checkpoint
                where chain_id = ? order by seq""", AuditCheckpoints::view, chainId);
    }

    private static CheckpointView view(java.sql.ResultSet rs, int n) throws java.sql.SQLException {
        return new CheckpointView(rs.getObject(1, UUID.class), rs.getLong(2), AuditHashing.hex(rs.getBytes(3)),
                AuditEventQueries.instant(rs, 4), rs.getString(5), AuditHashing.hex(rs.getBytes(6)));
    }

    private Optional<CheckpointView> write(UUID chainId) {
        // The head row is locked like a writer locks it, so the checkpoint names a row that is committed.
        List<Object[]> head = jdbc.query("""
                select e.seq, e.row_hash from audit_chain c
                join audit_event e on e.chain_id = c.chain_id and e.seq = c.last_seq
                where c.chain_id = ? for update of c""",
                (rs, n) -> new Object[] {rs.getLong(1), rs.getBytes(2)}, chainId);
        if (head.isEmpty()) {
            return Optional.empty();
        }
        long seq = (Long) head.get(0)[0];
        byte[] rowHash = (byte[]) head.get(0)[1];
        Instant createdAt = AuditHashing.toStoredPrecision(clock.instant());
        byte[] mac = signer.mac(chainId, seq, rowHash, createdAt);
        int inserted = jdbc.update("""
                insert into audit_checkpoint (chain_id, seq, row_hash, created_at, key_id, mac)
                values (?, ?, ?, ?, ?, ?) on conflict do nothing""",
                chainId, seq, rowHash, Timestamp.from(createdAt), signer.keyId(), mac);
        if (inserted == 0) {
            return Optional.empty();
        }
        return Optional.of(new CheckpointView(chainId, seq, AuditHashing.hex(rowHash), createdAt, signer.keyId(),
                AuditHashing.hex(mac)));
    }
}
