package org.swingclearance.engine.load;

import java.util.List;
import java.util.Objects;

/**
 * Mechanical dose of swinging = Σ reps × demand-to-capacity ratio D of the configuration swung (engine.md §9, a
 * product definition). D comes from the mechanics engine.
 */
public final class MechanicalDose {

    /**
     * One block of swings.
     *
     * @param reps         swings, ≥ 0
     * @param demandRatio  demand-to-capacity ratio D of the configuration, ≥ 0
     */
    public record Block(int reps, double demandRatio) {
        public Block {
            if (reps < 0) {
                throw new IllegalArgumentException("reps must be ≥ 0, was " + reps);
            }
            Checks.nonNegative(demandRatio, "demand ratio");
        }
    }

    private MechanicalDose() {
    }

    /** Σ reps × D over the blocks; 0 for none. */
    public static double of(List<Block> blocks) {
        Objects.requireNonNull(blocks, "blocks");
        double dose = 0;
        for (Block block : blocks) {
            dose += block.reps() * block.demandRatio();
        }
        return dose;
    }
}
