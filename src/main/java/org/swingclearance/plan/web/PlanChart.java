package org.swingclearance.plan.web;

import java.util.List;
import java.util.Locale;
import org.swingclearance.plan.PlanStepView;

/**
 * The data block of the demand line chart (plan.js draws it with Chart.js): one point per step with its start date
 * as text, D and whether it is provisional, and the number of the step the re-screen gate stands before.
 */
public record PlanChart(List<Point> points, Integer gateStep) {

    /** One step on the chart. */
    public record Point(int step, String startsOn, double d, boolean provisional) {
    }

    static PlanChart of(List<PlanStepView> steps, Integer gateStep) {
        return new PlanChart(steps.stream().map(s -> new Point(s.number(), s.startsOn().toString(),
                Double.parseDouble(String.format(Locale.ROOT, "%.4f", s.demandRatio())), s.provisional())).toList(),
                gateStep);
    }
}
