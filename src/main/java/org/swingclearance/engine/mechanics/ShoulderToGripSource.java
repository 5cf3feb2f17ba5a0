package org.swingclearance.engine.mechanics;

/** Where the shoulder-to-grip distance of a {@link Body} came from. */
public enum ShoulderToGripSource {
    /** 0.386 × stature: upper arm + forearm + half the hand (Drillis &amp; Contini via Winter Fig. 4.1). */
    ESTIMATED_FROM_STATURE("estimated from stature"),
    /** Measured on the patient, arm straight, shoulder joint centre to the centre of the fist. */
    MEASURED("measured");

    private final String label;

    ShoulderToGripSource(String label) {
        this.label = label;
    }

    /** Plain-language label shown beside the value, e.g. "estimated from stature". */
    public String label() {
        return label;
    }
}
