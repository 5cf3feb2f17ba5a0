package org.swingclearance.audit;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.Arrays;
import java.util.List;
import java.util.NavigableMap;
import java.util.OptionalLong;
import java.util.TreeMap;
import java.util.UUID;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;

/**
 * Walks a chain in seq order and finds its first broken place (security-audit-interop.md B.2 step 7): seq
 * continuity, each row's link to the row before it, each row's hash recomputed from its content, the signed
 * checkpoints, and the chain head. Rows are read in keyset pages without a long transaction, so a walk of a
 * million rows neither holds locks nor keeps a snapshot open, and writers go on appending meanwhile.
 * It never writes; the caller audits the verification.
 */
@Component
public class AuditVerifier {

    private static final int PAGE = 20_000;
    /** How far from its place a moved row is looked for when a link or hash breaks. */
    private static final int MOVE_SEARCH = 3;

    private final JdbcTemplate jdbc;
    private final CheckpointSigner signer;

    AuditVerifier(JdbcTemplate jdbc, CheckpointSigner signer) {
        this.jdbc = jdbc;
        this.signer = signer;
    }

    /** Every chain of the installation (clinics and the installation chain), for the command line. */
    public List<UUID> chains() {
        return jdbc.queryForList("select chain_id from audit_chain order by chain_id", UUID.class);
    }

    public VerificationReport verify(UUID chainId) {
        long started = System.nanoTime();
        // Checkpoints before the head: a checkpoint is only ever made of a head that existed, so anything they
        // name beyond the head read afterwards was cut off, never merely appended during the walk.
        NavigableMap<Long, Checkpoint> checkpoints = new TreeMap<>();
        jdbc.query("select seq, row_hash, created_at, key_id, mac from audit_checkpoint where chain_id = ? order by seq",
                rs -> {
                    checkpoints.put(rs.getLong(1), new Checkpoint(rs.getLong(1), rs.getBytes(2),
                            rs.getObject(3, OffsetDateTime.class).toInstant(), rs.getString(4), rs.getBytes(5)));
                }, chainId);
        List<Head> heads = jdbc.query("select last_seq, last_hash from audit_chain where chain_id = ?",
                (rs, n) -> new Head(rs.getLong(1), rs.getBytes(2)), chainId);
        Head head = heads.isEmpty() ? new Head(0, AuditHashing.GENESIS) : heads.get(0);

        Walk walk = new Walk(chainId, checkpoints);
        long after = 0;
        while (walk.open() && after < head.lastSeq()) {
            int[] read = {0};
            long[] last = {after};
            jdbc.query("""
                    select seq, event_id, occurred_at, clinic_id, actor_id, actor_name, actor_role, action, object_type,
                           object_id, patient_id, outcome, client_address, request_id, detail, prev_hash, row_hash
                    from audit_event where chain_id = ? and seq > ? and seq <= ? order by seq limit ?""",
                    rs -> {
                        read[0]++;
                        last[0] = rs.getLong(1);
                        walk.accept(row(chainId, rs), rs.getBytes(17));
                    }, chainId, after, head.lastSeq(), PAGE);
            if (read[0] == 0) {
                break;
            }
            after = last[0];
        }
        walk.finish(head);
        return new VerificationReport(chainId, walk.rows, walk.expectedSeq - 1,
                walk.rows == 0 ? null : AuditHashing.hex(walk.prevHash), walk.checkpointsChecked,
                walk.checkpointsWithOtherKey, walk.firstBreak, Duration.ofNanos(System.nanoTime() - started));
    }

    private static AuditRecord row(UUID chainId, ResultSet rs) throws SQLException {
        return new AuditRecord(chainId, rs.getLong(1), rs.getObject(2, UUID.class),
                rs.getObject(3, OffsetDateTime.class).toInstant(), rs.getObject(4, UUID.class),
                rs.getObject(5, UUID.class), rs.getString(6), rs.getString(7), rs.getString(8), rs.getString(9),
                rs.getString(10), rs.getObject(11, UUID.class), AuditOutcome.valueOf(rs.getString(12)),
                rs.getString(13), rs.getString(14), rs.getString(15), rs.getBytes(16));
    }

    private record Checkpoint(long seq, byte[] rowHash, Instant createdAt, String keyId, byte[] mac) {
    }

    private record Head(long lastSeq, byte[] lastHash) {
    }

    /** The state of one walk: where it is, what it has checked, and the first break once found. */
    private final class Walk {

        private final UUID chainId;
        private final NavigableMap<Long, Checkpoint> checkpoints;
        private long expectedSeq = 1;
        private byte[] prevHash = AuditHashing.GENESIS;
        private long rows;
        private int checkpointsChecked;
        private int checkpointsWithOtherKey;
        private ChainBreak firstBreak;

        Walk(UUID chainId, NavigableMap<Long, Checkpoint> checkpoints) {
            this.chainId = chainId;
            this.checkpoints = checkpoints;
        }

        boolean open() {
            return firstBreak == null;
        }

        void accept(AuditRecord row, byte[] storedHash) {
            if (firstBreak != null) {
                return;
            }
            if (row.seq() != expectedSeq) {
                long missingTo = row.seq() - 1;
                fail(BreakKind.ROW_MISSING, expectedSeq, null, missingTo == expectedSeq
                        ? "row missing (gap at seq " + expectedSeq + "): seq " + (expectedSeq - 1) + " is followed by seq "
                                + row.seq()
                        : "rows missing (gap at seq " + expectedSeq + " to " + missingTo + "): seq " + (expectedSeq - 1)
                                + " is followed by seq " + row.seq());
                return;
            }
            if (!Arrays.equals(row.prevHash(), prevHash)) {
                OptionalLong writtenAs = writtenAs(row, storedHash);
                fail(BreakKind.LINK_BROKEN, row.seq(), row.eventId(), "order/link broken: prev_hash "
                        + AuditHashing.hex(row.prevHash()) + " is not the row_hash of seq " + (row.seq() - 1) + " ("
                        + AuditHashing.hex(prevHash) + "); "
                        + (writtenAs.isPresent() && writtenAs.getAsLong() != row.seq()
                                ? "this row was written as seq " + writtenAs.getAsLong() + ": rows were reordered"
                                : writtenAs.isPresent()
                                        ? "this row is unchanged, so the row before it was rewritten or a row was put in between"
                                        : "this row's content was changed as well"));
                return;
            }
            byte[] recomputed = AuditHashing.hash(row);
            if (!Arrays.equals(recomputed, storedHash)) {
                OptionalLong writtenAs = writtenAs(row, storedHash);
                fail(writtenAs.isPresent() ? BreakKind.LINK_BROKEN : BreakKind.ROW_CONTENT_CHANGED, row.seq(),
                        row.eventId(), writtenAs.isPresent()
                        ? "order/link broken: this row was written as seq " + writtenAs.getAsLong()
                        : "row content changed: the stored row_hash " + AuditHashing.hex(storedHash)
                                + " does not match the hash of the row as it reads now (" + AuditHashing.hex(recomputed)
                                + ")");
                return;
            }
            Checkpoint checkpoint = checkpoints.get(row.seq());
            if (checkpoint != null && !checkCheckpoint(checkpoint, storedHash, row.eventId())) {
                return;
            }
            prevHash = storedHash;
            expectedSeq++;
            rows++;
        }

        void finish(Head head) {
            if (firstBreak != null) {
                return;
            }
            long lastSeq = expectedSeq - 1;
            for (Checkpoint beyond : checkpoints.tailMap(lastSeq, false).values()) {
                if (!authentic(beyond)) {
                    return;
                }
                if (beyond.keyId().equals(signer.keyId())) {
                    checkpointsChecked++;
                    fail(BreakKind.TAIL_TRUNCATED, lastSeq + 1, null, "tail truncated vs checkpoint: the checkpoint of "
                            + beyond.createdAt() + " names seq " + beyond.seq() + ", but the chain ends at seq "
                            + lastSeq);
                    return;
                }
            }
            if (head.lastSeq() != lastSeq) {
                fail(BreakKind.HEAD_MISMATCH, lastSeq + 1, null, "tail truncated vs chain head: the head names seq "
                        + head.lastSeq() + ", but the rows end at seq " + lastSeq);
            } else if (lastSeq > 0 && !Arrays.equals(head.lastHash(), prevHash)) {
                fail(BreakKind.HEAD_MISMATCH, lastSeq, null, "the chain head's hash "
                        + AuditHashing.hex(head.lastHash()) + " is not the row_hash of its last row, seq " + lastSeq);
            }
        }

        /** Compares a checkpoint with the row hash at its seq; false (and a break) if it does not hold. */
        private boolean checkCheckpoint(Checkpoint checkpoint, byte[] storedHash, UUID eventId) {
            if (!authentic(checkpoint)) {
                return false;
            }
            if (!checkpoint.keyId().equals(signer.keyId())) {
                return true;
            }
            checkpointsChecked++;
            if (!Arrays.equals(checkpoint.rowHash(), storedHash)) {
                fail(BreakKind.CHECKPOINT_MISMATCH, checkpoint.seq(), eventId, "the checkpoint of "
                        + checkpoint.createdAt() + " records row_hash " + AuditHashing.hex(checkpoint.rowHash())
                        + " for seq " + checkpoint.seq() + ", the chain now holds " + AuditHashing.hex(storedHash)
                        + ": the chain was rewritten up to here");
                return false;
            }
            return true;
        }

        /** False (and a break) when a checkpoint made with our key does not carry our MAC. */
        private boolean authentic(Checkpoint checkpoint) {
            if (!checkpoint.keyId().equals(signer.keyId())) {
                checkpointsWithOtherKey++;
                return true;
            }
            if (!signer.verifies(chainId, checkpoint.seq(), checkpoint.rowHash(), checkpoint.createdAt(),
                    checkpoint.mac())) {
                fail(BreakKind.CHECKPOINT_FORGED, checkpoint.seq(), null, "the checkpoint of " + checkpoint.createdAt()
                        + " for seq " + checkpoint.seq() + " does not carry a valid HMAC for the configured key: "
                        + "it was changed or made without the key");
                return false;
            }
            return true;
        }

        /** The seq near its place under which this row's content hashes to its stored hash, if any. */
        private OptionalLong writtenAs(AuditRecord row, byte[] storedHash) {
            for (long seq = Math.max(1, row.seq() - MOVE_SEARCH); seq <= row.seq() + MOVE_SEARCH; seq++) {
                AuditRecord candidate = new AuditRecord(row.chainId(), seq, row.eventId(), row.occurredAt(),
                        row.clinicId(), row.actorId(), row.actorName(), row.actorRole(), row.action(), row.objectType(),
                        row.objectId(), row.patientId(), row.outcome(), row.clientAddress(), row.requestId(),
                        row.detail(), row.prevHash());
                if (Arrays.equals(AuditHashing.hash(candidate), storedHash)) {
                    return OptionalLong.of(seq);
                }
            }
            return OptionalLong.empty();
        }

        private void fail(BreakKind kind, long seq, UUID eventId, String explanation) {
            firstBreak = new ChainBreak(kind, seq, eventId, explanation);
        }
    }
}
