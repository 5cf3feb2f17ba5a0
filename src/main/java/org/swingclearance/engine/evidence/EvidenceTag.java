package org.swingclearance.engine.evidence;

/** How far a figure was checked, using the tags of the clinical reference ({@code [V]}, {@code [S]}, {@code [M]}, {@code [C]}). */
public enum EvidenceTag {
    /** {@code [V]}: checked against the primary paper's abstract or table text. */
    VERIFIED("V"),
    /** {@code [S]}: checked only against a secondary source (textbook, review, pathway page). */
    SECONDARY("S"),
    /** {@code [M]}: recalled, not checked against any source. */
    FROM_MEMORY("M"),
    /** {@code [C]}: common practice or a product convention, no source. */
    COMMON_PRACTICE("C"),
    /**
     * A definition or law of physics (torque = force × lever arm, the exact pound); not a clinical claim. The
     * clinical reference labels these "physics"; practice rules never carry this tag.
     */
    PHYSICAL_LAW("physics");

    private final String label;

    EvidenceTag(String label) {
        this.label = label;
    }

    /** The short label the clinical reference prints in brackets, e.g. {@code "V"}; never null. */
    public String label() {
        return label;
    }
}
