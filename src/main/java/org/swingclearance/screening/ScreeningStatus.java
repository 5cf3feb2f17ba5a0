package org.swingclearance.screening;

/** State of one screening version: a draft is editable; a signed version and a signed amendment are frozen. */
public enum ScreeningStatus {
    DRAFT, SIGNED, AMENDED;

    public boolean signed() {
        return this != DRAFT;
    }
}
