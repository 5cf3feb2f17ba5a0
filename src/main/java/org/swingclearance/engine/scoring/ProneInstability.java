package org.swingclearance.engine.scoring;

import org.swingclearance.engine.evidence.Citations;

/** Prone instability test (Hicks et al. 2005, clinical.md §3.4). */
public final class ProneInstability {

    private ProneInstability() {
    }

    /**
     * Positive when there is pain in position 1 (feet on the floor) and it substantially eases or resolves in
     * position 2 (feet lifted); mild easing counts as not eased; no pain in position 1 is negative.
     *
     * @param painInPositionOne    pain on pressure with feet on the floor; null = not tested
     * @param easedInPositionTwo   that pain substantially eased or resolved with feet lifted; may be null when there
     *                             was no pain in position 1
     * @return {@link Unit#YES_NO}; not scorable when position 1 is missing, or position 1 was painful and position 2
     *         is missing
     */
    public static Score classify(Boolean painInPositionOne, Boolean easedInPositionTwo) {
        if (painInPositionOne == null) {
            return Score.notTested(Unit.YES_NO, Citations.HICKS_2005_PIT,
                    "prone instability test needs position 1; not tested: pain in position 1");
        }
        if (!painInPositionOne) {
            return Score.yesNo(false, Citations.HICKS_2005_PIT);
        }
        if (easedInPositionTwo == null) {
            return Score.notTested(Unit.YES_NO, Citations.HICKS_2005_PIT,
                    "painful position 1 needs position 2 to classify; not tested: easing in position 2");
        }
        return Score.yesNo(easedInPositionTwo, Citations.HICKS_2005_PIT);
    }
}
