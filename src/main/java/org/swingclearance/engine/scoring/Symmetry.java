package org.swingclearance.engine.scoring;

import java.util.List;
import org.swingclearance.engine.evidence.Citations;

/** Side-to-side comparison of one measurement: limb symmetry index, deficit and absolute difference. */
public final class Symmetry {

    private Symmetry() {
    }

    /**
     * Limb symmetry index = involved ÷ uninvolved × 100 (clinical.md §1.3).
     *
     * @param involved   value on the involved side, any non-negative unit; null = not tested
     * @param uninvolved value on the uninvolved side, same unit; null = not tested
     * @return LSI in {@link Unit#PERCENT}, ≥ 0; not scorable when a side is missing or the uninvolved value is 0
     * @throws IllegalArgumentException when a value is negative or not finite
     */
    public static Score limbSymmetryIndex(Double involved, Double uninvolved) {
        List<String> missing = Inputs.missing("involved side", involved, "uninvolved side", uninvolved);
        if (!missing.isEmpty()) {
            return Score.notTested(Unit.PERCENT, Citations.LIMB_SYMMETRY,
                    Inputs.notTestedRule("limb symmetry index needs both sides", missing));
        }
        Inputs.nonNegative(involved, "involved");
        Inputs.nonNegative(uninvolved, "uninvolved");
        if (uninvolved == 0) {
            return Score.notScorable(Unit.PERCENT, Citations.LIMB_SYMMETRY, NotScorable.Reason.UNDEFINED,
                    "limb symmetry index is undefined when the uninvolved side measures 0");
        }
        return Score.of(involved / uninvolved * 100, Unit.PERCENT, Citations.LIMB_SYMMETRY);
    }

    /**
     * Deficit = uninvolved − involved (clinical.md §1.3); positive when the involved side is worse.
     *
     * @param involved   involved-side value; null = not tested
     * @param uninvolved uninvolved-side value; null = not tested
     * @param unit       unit of both values; never null
     * @return the signed deficit in {@code unit}; not scorable when a side is missing
     */
    public static Score deficit(Double involved, Double uninvolved, Unit unit) {
        List<String> missing = Inputs.missing("involved side", involved, "uninvolved side", uninvolved);
        if (!missing.isEmpty()) {
            return Score.notTested(unit, Citations.LIMB_SYMMETRY,
                    Inputs.notTestedRule("a side-to-side deficit needs both sides", missing));
        }
        return Score.of(uninvolved - involved, unit, Citations.LIMB_SYMMETRY);
    }
}
