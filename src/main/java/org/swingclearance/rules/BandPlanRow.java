package org.swingclearance.rules;

import jakarta.persistence.Embeddable;

/** Stored plan-step defaults of one band (table practice_rule_band_plan). */
@Embeddable
class BandPlanRow {

    private int sets;
    private int reps;
    private int effortCap;

    protected BandPlanRow() {
    }

    BandPlanRow(BandPlanDefaults defaults) {
        this.sets = defaults.sets();
        this.reps = defaults.reps();
        this.effortCap = defaults.effortCap();
    }

    BandPlanDefaults toDefaults() {
        return new BandPlanDefaults(sets, reps, effortCap);
    }
}
