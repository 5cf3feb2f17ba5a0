package org.swingclearance.plan;

import jakarta.persistence.Column;
import jakarta.persistence.Embeddable;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import java.util.UUID;

/** A state the clinician pinned or removed, by club, grip mark and cycle time; pins keep their order. */
@Embeddable
public class PlanAdjustment {

    @Enumerated(EnumType.STRING)
    private AdjustmentKind kind;
    private UUID clubId;
    private double gripMarkCm;
    @Column(name = "cycle_time_s")
    private double cycleTimeS;

    protected PlanAdjustment() {
    }

    public PlanAdjustment(AdjustmentKind kind, UUID clubId, double gripMarkCm, double cycleTimeS) {
        this.kind = kind;
        this.clubId = clubId;
        this.gripMarkCm = gripMarkCm;
        this.cycleTimeS = cycleTimeS;
    }

    /** Whether this adjustment names the same state as the step (grip marks and cycle times to 1e-6). */
    boolean sameStateAs(PlannedStep step) {
        return clubId.equals(step.getClubId()) && Math.abs(gripMarkCm - step.getGripMarkCm()) < 1e-6
                && Math.abs(cycleTimeS - step.getCycleTimeS()) < 1e-6;
    }

    public AdjustmentKind getKind() { return kind; }
    public UUID getClubId() { return clubId; }
    public double getGripMarkCm() { return gripMarkCm; }
    public double getCycleTimeS() { return cycleTimeS; }
}
