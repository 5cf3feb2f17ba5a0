package org.swingclearance.plan.web;

import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;

/** Sets × reps and effort cap (CR-10) of one band in the plan settings form. */
public class DoseForm {

    private String band;
    @NotNull
    @Min(1)
    @Max(20)
    private Integer sets;
    @NotNull
    @Min(1)
    @Max(200)
    private Integer reps;
    @NotNull
    @Min(0)
    @Max(10)
    private Integer effortCap;

    public DoseForm() {
    }

    DoseForm(String band, int sets, int reps, int effortCap) {
        this.band = band;
        this.sets = sets;
        this.reps = reps;
        this.effortCap = effortCap;
    }

    public String getBand() { return band; }
    public void setBand(String band) { this.band = band; }
    public Integer getSets() { return sets; }
    public void setSets(Integer sets) { this.sets = sets; }
    public Integer getReps() { return reps; }
    public void setReps(Integer reps) { this.reps = reps; }
    public Integer getEffortCap() { return effortCap; }
    public void setEffortCap(Integer effortCap) { this.effortCap = effortCap; }
}
