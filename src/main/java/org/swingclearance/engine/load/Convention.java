package org.swingclearance.engine.load;

import java.util.Objects;
import org.swingclearance.engine.evidence.Citation;

/**
 * A convention of load monitoring that reports must state (clinical.md: where a published rule is ambiguous, the
 * chosen convention is exposed on the page).
 *
 * @param code     stable key, e.g. "load.ewma-seed", for a UI message or a snapshot; never blank
 * @param text     the convention in words with the values in force; never blank
 * @param citation its source or its [C] label; never null
 */
public record Convention(String code, String text, Citation citation) {

    public Convention {
        if (code == null || code.isBlank() || text == null || text.isBlank()) {
            throw new IllegalArgumentException("code and text must not be blank");
        }
        Objects.requireNonNull(citation, "citation");
    }
}
