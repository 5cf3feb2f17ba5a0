package org.swingclearance.engine.plan;

/**
 * How one configuration stands against the patient's capacity.
 *
 * <p><b>Demand ratio D.</b> For each capacity constraint (C1 peak shoulder torque, C2 hold torque, C3 peak grip pull)
 * the ratio of the demand to the share of capacity the <em>current</em> load band allows, e.g. for C1
 * τ_peak / (f_current · τ_cap); D is the largest of these ratios. D ≤ 1 means the configuration fits the current
 * band; D = 1.3 means it needs 30 % more than the band allows. Because every band scales all capacities by the same
 * fraction, a relative rise of D from one state to the next is the same whichever band it is measured against, so
 * the step limit compares D values directly. D is computed even when a categorical constraint (C4 range of motion,
 * C5 hip-driven pattern) excludes the configuration; it may be +∞ when the band allows nothing (Hold).
 *
 * <p><b>Beyond the current band.</b> {@code permitted} means all of C1–C5 hold at the current band (so D ≤ 1).
 * {@code permittedAtNextBand} means all of C1–C5 would hold if the patient were in the next band (for C1–C3:
 * D · f_current / f_next ≤ 1); such states can only appear as provisional plan steps behind a re-screen gate. When
 * there is no next band (Open), {@code permittedAtNextBand} equals {@code permitted}.
 *
 * @param bindingConstraint code of the constraint that decides: the one with the largest ratio, or the categorical
 *                          constraint that excludes the configuration (the mechanics engine's codes, e.g. "C1")
 */
public record Evaluation(boolean permitted, double demandRatio, String bindingConstraint, boolean permittedAtNextBand) {

    /** Slack for rounding in the evaluator's own D ≤ 1 decision. */
    private static final double BAND_TOLERANCE = 1e-9;

    public Evaluation {
        if (Double.isNaN(demandRatio) || demandRatio < 0) {
            throw new IllegalArgumentException("Demand ratio must be zero or more, was " + demandRatio);
        }
        if (bindingConstraint == null || bindingConstraint.isBlank()) {
            throw new IllegalArgumentException("An evaluation must name its binding constraint.");
        }
        if (permitted && !(demandRatio <= 1 + BAND_TOLERANCE)) {
            throw new IllegalArgumentException("A permitted state must have D ≤ 1, was " + demandRatio);
        }
        if (permitted && !permittedAtNextBand) {
            throw new IllegalArgumentException("A state permitted in the current band is permitted in the next band.");
        }
        if (permittedAtNextBand && !Double.isFinite(demandRatio)) {
            throw new IllegalArgumentException("A permitted state must have a finite demand ratio.");
        }
    }

    /** All constraints hold at the current band. */
    public static Evaluation withinBand(double demandRatio, String bindingConstraint) {
        return new Evaluation(true, demandRatio, bindingConstraint, true);
    }

    /** Outside the current band but within the next one: a provisional step behind a re-screen gate. */
    public static Evaluation withinNextBand(double demandRatio, String bindingConstraint) {
        return new Evaluation(false, demandRatio, bindingConstraint, true);
    }

    /** Outside the envelope even at the next band. */
    public static Evaluation outsideEnvelope(double demandRatio, String bindingConstraint) {
        return new Evaluation(false, demandRatio, bindingConstraint, false);
    }
}
