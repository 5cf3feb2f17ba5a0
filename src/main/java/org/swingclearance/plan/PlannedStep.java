package org.swingclearance.plan;

import jakarta.persistence.Column;
import jakarta.persistence.Embeddable;
import java.time.LocalDate;
import java.util.UUID;

/**
 * One step of a plan version as computed and shown: the club (its name and mass copied at the time), grip mark,
 * cycle time, dose, demand ratio D with its binding constraint, whether it lies beyond the current band, the gate
 * before it and the day it starts.
 */
@Embeddable
public class PlannedStep {

    private int number;
    private UUID clubId;
    private String clubName;
    private double clubMassKg;
    private double gripMarkCm;
    @Column(name = "cycle_time_s") // the naming strategy would drop the underscore before a final capital
    private double cycleTimeS;
    private String changedDial;
    private int sets;
    private int reps;
    private int effortCap;
    private double demandRatio;
    private double rise;
    private String bindingConstraint;
    private boolean provisional;
    private String gate;
    private boolean pinned;
    private LocalDate startsOn;

    protected PlannedStep() {
    }

    PlannedStep(int number, UUID clubId, String clubName, double clubMassKg, double gripMarkCm, double cycleTimeS,
                String changedDial, int sets, int reps, int effortCap, double demandRatio, double rise,
                String bindingConstraint, boolean provisional, boolean gateBefore, boolean pinned, LocalDate startsOn) {
        this.number = number;
        this.clubId = clubId;
        this.clubName = clubName;
        this.clubMassKg = clubMassKg;
        this.gripMarkCm = gripMarkCm;
        this.cycleTimeS = cycleTimeS;
        this.changedDial = changedDial;
        this.sets = sets;
        this.reps = reps;
        this.effortCap = effortCap;
        this.demandRatio = demandRatio;
        this.rise = rise;
        this.bindingConstraint = bindingConstraint;
        this.provisional = provisional;
        this.gate = gateBefore ? "RESCREEN_BEFORE" : "NONE";
        this.pinned = pinned;
        this.startsOn = startsOn;
    }

    public int getNumber() { return number; }
    public UUID getClubId() { return clubId; }
    public String getClubName() { return clubName; }
    public double getClubMassKg() { return clubMassKg; }
    public double getGripMarkCm() { return gripMarkCm; }
    public double getCycleTimeS() { return cycleTimeS; }
    public String getChangedDial() { return changedDial; }
    public int getSets() { return sets; }
    public int getReps() { return reps; }
    public int getEffortCap() { return effortCap; }
    public double getDemandRatio() { return demandRatio; }
    public double getRise() { return rise; }
    public String getBindingConstraint() { return bindingConstraint; }
    public boolean isProvisional() { return provisional; }
    public boolean isGateBefore() { return "RESCREEN_BEFORE".equals(gate); }
    public boolean isPinned() { return pinned; }
    public LocalDate getStartsOn() { return startsOn; }
}
