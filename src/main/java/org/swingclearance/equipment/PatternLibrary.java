package org.swingclearance.equipment;

import java.util.List;

/** The swing pattern library as the clinic sees it: shared built-ins, its own in use, its own retired. */
public record PatternLibrary(List<SwingPatternView> builtIn, List<Own> own, List<SwingPatternView> retired) {

    /** One of the clinic's own patterns with the version a retire request must quote. */
    public record Own(SwingPatternView pattern, long version) {
    }
}
