package org.swingclearance.engine.scoring;

/** Sex as used by sex-specific reference tables; never apply one sex's norm to the other (clinical.md §2.3). */
public enum Sex {
    MALE,
    FEMALE
}
