package org.swingclearance.audit;

import java.util.UUID;

/**
 * The first broken place of a chain: the seq (and event, when a row exists there) and what differs,
 * in words for the report and the command line.
 */
public record ChainBreak(BreakKind kind, long seq, UUID eventId, String explanation) {
}
