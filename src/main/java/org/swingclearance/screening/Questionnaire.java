package org.swingclearance.screening;

/**
 * A patient-reported questionnaire, stored as item responses only (never item wording; the licensed forms come
 * from their owners). Scored by the engine: QuickDASH (clinical.md §4.1), Oswestry (§4.2), SPADI (§4.3), TSK-11 (§4.5).
 */
public enum Questionnaire {
    QUICKDASH(11, 1, 5, false),
    ODI(10, 0, 5, false),
    SPADI(13, 0, 10, true),
    TSK_11(11, 1, 4, true);

    private final int items;
    private final int minResponse;
    private final int maxResponse;
    private final boolean optional;

    Questionnaire(int items, int minResponse, int maxResponse, boolean optional) {
        this.items = items;
        this.minResponse = minResponse;
        this.maxResponse = maxResponse;
        this.optional = optional;
    }

    public int items() { return items; }
    public int minResponse() { return minResponse; }
    public int maxResponse() { return maxResponse; }
    public boolean optional() { return optional; }

    /** The key of item {@code number} (1-based) in stored measurements and form fields, e.g. {@code QUICKDASH_3}. */
    public String itemKey(int number) {
        if (number < 1 || number > items) {
            throw new IllegalArgumentException(name() + " has no item " + number);
        }
        return name() + "_" + number;
    }
}
