package org.swingclearance.audit;

import java.time.Duration;
import java.util.UUID;

/**
 * The result of walking one chain: how many rows and checkpoints were checked, the last verified row, and
 * the first break if there is one. Checkpoints signed with another key are counted, not trusted.
 */
public record VerificationReport(UUID chainId, long rowsChecked, long lastSeq, String lastHash,
                                 int checkpointsChecked, int checkpointsWithOtherKey, ChainBreak firstBreak,
                                 Duration took) {

    public boolean intact() {
        return firstBreak == null;
    }

    /** A few lines for the command line and the application log. */
    public String describe() {
        StringBuilder text = new StringBuilder();
        text.append("chain ").append(chainId).append(": ").append(intact() ? "INTACT" : "BROKEN").append('\n');
        text.append("  rows checked: ").append(rowsChecked).append(", last verified seq: ").append(lastSeq)
                .append(lastHash == null ? "" : " (row_hash " + lastHash + ")").append('\n');
        text.append("  checkpoints checked: ").append(checkpointsChecked);
        if (checkpointsWithOtherKey > 0) {
            text.append(", signed with another key (not checked): ").append(checkpointsWithOtherKey);
        }
        text.append('\n');
        if (firstBreak != null) {
            text.append("  first break: ").append(firstBreak.kind()).append(" at seq ").append(firstBreak.seq());
            if (firstBreak.eventId() != null) {
                text.append(" (event ").append(firstBreak.eventId()).append(')');
            }
            text.append("\n  ").append(firstBreak.explanation()).append('\n');
        }
        text.append("  took ").append(took.toMillis()).append(" ms\n");
        return text.toString();
    }
}
