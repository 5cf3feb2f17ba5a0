package org.swingclearance.plan;

import java.time.Instant;
import java.util.List;
import java.util.UUID;

/**
 * A plan version on the clinician's plan page: status, sources, settings, pins and removals, the computed steps and
 * the outcome message (why the plan stops short of its goal, if it does).
 */
public record PlanVersionView(UUID id, UUID planId, int number, PlanStatus status, long lockVersion,
                              UUID sourceScreeningId, int sourceScreeningVersion, int rulesVersion,
                              String engineVersion, String band, String patternName, PlanSettings settings,
                              List<PlanAdjustment> adjustments, List<StepDetail> steps, double stepLimit,
                              int painDuringLimit, String outcomeKey, List<String> outcomeArgs, Instant createdAt,
                              Instant issuedAt, String issuedByName, String fingerprint) {

    public PlanVersionView {
        adjustments = List.copyOf(adjustments);
        steps = List.copyOf(steps);
        outcomeArgs = List.copyOf(outcomeArgs);
    }

    public boolean draft() {
        return status == PlanStatus.DRAFT;
    }

    public Integer gateStep() {
        return steps.stream().filter(StepDetail::gateBefore).map(s -> s.step().number()).findFirst().orElse(null);
    }

    public long pinnedCount() {
        return adjustments.stream().filter(a -> a.getKind() == AdjustmentKind.PIN).count();
    }

    public long removedCount() {
        return adjustments.stream().filter(a -> a.getKind() == AdjustmentKind.REMOVE).count();
    }
}
