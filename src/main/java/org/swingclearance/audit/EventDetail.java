package org.swingclearance.audit;

import java.util.List;

/** One event with every recorded field and hash, and the other events about the same record. */
public record EventDetail(EventRow event, List<EventRow> sameObject) {
}
