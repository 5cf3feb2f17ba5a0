package org.swingclearance.audit;

import java.util.List;

/** One page of the filtered audit log, newest first, and the cursor of the next (older) page if there is one. */
public record EventPage(List<EventRow> rows, LogCursor next) {

    public boolean hasNext() {
        return next != null;
    }
}
