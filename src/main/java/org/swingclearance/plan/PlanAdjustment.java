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
    @Column(name = "cycle_time_s") // the naming strategy would drop the underscore before a final capital
    private double cycleTimeS;

    protected PlanAdjustment() {
    }

    public PlanAdjustment(AdjustmentKind kind, UUID clubId, double gripMarkCm, double cycleTimeS) {
        this.kind = kind;
        this.clubId = clubId;
        this.gripMarkCm = gripMarkCm;
        this.cycleTimeS = cycleTimeS;
    }

    public AdjustmentKind getKind() { return kind; }
    public UUID getClubId() { return clubId; }
    public double getGripMarkCm() { return gripMarkCm; }
    public double getCycleTimeS() { return cycleTimeS; }
}
