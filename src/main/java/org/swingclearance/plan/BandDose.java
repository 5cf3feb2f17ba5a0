package org.swingclearance.plan;

import jakarta.persistence.Column;
import jakarta.persistence.Embeddable;

/** Sets × reps and the session effort cap (CR-10) for plan steps that lie in one load band. */
@Embeddable
public class BandDose {

    @Column(name = "band")
    private String band;
    private int sets;
    private int reps;
    private int effortCap;

    protected BandDose() {
    }

    public BandDose(String band, int sets, int reps, int effortCap) {
        this.band = band;
        this.sets = sets;
        this.reps = reps;
        this.effortCap = effortCap;
    }

    public String getBand() { return band; }
    public int getSets() { return sets; }
    public int getReps() { return reps; }
    public int getEffortCap() { return effortCap; }
}
