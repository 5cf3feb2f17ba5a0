package org.swingclearance.engine.plan;

/**
 * Every state of a plan space evaluated exactly once, held in flat arrays indexed by slot so that the search's
 * inner loops read primitives instead of calling the evaluator.
 */
final class EvaluatedSpace {

    final PlanSpace space;
    final double[] demandRatio;
    final boolean[] permitted;
    final boolean[] permittedAtNextBand;
    private final Evaluation[] evaluations;

    EvaluatedSpace(PlanSpace space, StateEvaluator evaluator) {
        this.space = space;
        int slots = space.slotCount();
        this.demandRatio = new double[slots];
        this.permitted = new boolean[slots];
        this.permittedAtNextBand = new boolean[slots];
        this.evaluations = new Evaluation[slots];
        for (int slot = 0; slot < slots; slot++) {
            if (!space.isState(slot)) {
                continue;
            }
            PlanState state = space.stateOfSlot(slot);
            Evaluation evaluation = evaluator.evaluate(space.club(state.club()), space.gripMarkM(state.gripMark()),
                    space.cycleTimeS(state.cycleRung()));
            if (evaluation == null) {
                throw new IllegalStateException("The evaluator gave no evaluation for " + state);
            }
            evaluations[slot] = evaluation;
            demandRatio[slot] = evaluation.demandRatio();
            permitted[slot] = evaluation.permitted();
            permittedAtNextBand[slot] = evaluation.permittedAtNextBand();
        }
    }

    Evaluation evaluation(int slot) {
        return evaluations[slot];
    }
}
