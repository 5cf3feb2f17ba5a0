package org.swingclearance.engine.evidence;

/** Confidence the clinical reference attaches to a figure ({@code H}, {@code M}, {@code L}), or none stated. */
public enum Confidence {
    HIGH("H"),
    MEDIUM("M"),
    LOW("L"),
    /** The reference gives a tag but no confidence for this figure. */
    NOT_STATED("");

    private final String label;

    Confidence(String label) {
        this.label = label;
    }

    /** The letter the clinical reference prints, empty for {@link #NOT_STATED}; never null. */
    public String label() {
        return label;
    }
}
