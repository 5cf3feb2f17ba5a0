package org.swingclearance.audit;

/** What the verifier found wrong at the first broken place of a chain. */
public enum BreakKind {
    /** The row's stored hash no longer matches its content: a field was changed after it was written. */
    ROW_CONTENT_CHANGED,
    /** A sequence number is missing: a row was deleted (the gap starts at the reported seq). */
    ROW_MISSING,
    /** The row does not follow the row before it: rows were reordered, or the previous row was rewritten. */
    LINK_BROKEN,
    /** A signed checkpoint names a later row than the chain holds: the tail was cut off. */
    TAIL_TRUNCATED,
    /** The row at a checkpoint's seq has another hash than the checkpoint: the chain was rewritten. */
    CHECKPOINT_MISMATCH,
    /** A checkpoint's HMAC does not verify with the configured key: the checkpoint itself was forged or changed. */
    CHECKPOINT_FORGED,
    /** The chain head (last seq and hash) does not match the last row: rows were removed or the head moved. */
    HEAD_MISMATCH
}
