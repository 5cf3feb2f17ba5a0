package org.swingclearance.engine.scoring;

import java.util.List;
import java.util.Objects;
import org.swingclearance.engine.evidence.Citations;

/**
 * Active straight leg raise (Mens et al. 2001, clinical.md §3.3): each side rated 0 (no difficulty) to 5 (unable);
 * score = left + right (0–10); positive when the sum is at least 1.
 *
 * @param total    left + right, {@link Unit#POINTS}, 0–10
 * @param positive 1 when total ≥ 1, else 0, {@link Unit#YES_NO}
 */
public record ActiveStraightLegRaise(Score total, Score positive) {

    public ActiveStraightLegRaise {
        Objects.requireNonNull(total, "total");
        Objects.requireNonNull(positive, "positive");
    }

    /**
     * Scores the test.
     *
     * @param left  left-side rating 0–5; null = not tested
     * @param right right-side rating 0–5; null = not tested
     * @throws IllegalArgumentException when a rating is outside 0–5
     */
    public static ActiveStraightLegRaise of(Integer left, Integer right) {
        List<String> missing = Inputs.missing("left rating", left, "right rating", right);
        if (!missing.isEmpty()) {
            String rule = Inputs.notTestedRule("ASLR needs both sides rated", missing);
            return new ActiveStraightLegRaise(Score.notTested(Unit.POINTS, Citations.MENS_2001, rule),
                    Score.notTested(Unit.YES_NO, Citations.MENS_2001, rule));
        }
        Inputs.inRange(left, 0, 5, "ASLR left");
        Inputs.inRange(right, 0, 5, "ASLR right");
        int total = left + right;
        return new ActiveStraightLegRaise(Score.of(total, Unit.POINTS, Citations.MENS_2001),
                Score.yesNo(total >= 1, Citations.MENS_2001));
    }
}
