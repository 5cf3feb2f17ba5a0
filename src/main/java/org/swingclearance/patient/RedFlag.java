package org.swingclearance.patient;

/**
 * The red-flag checklist (clinical.md §5): each flag names the condition it may signal and how fast to act.
 * Shoulder list after the BESS/BOA pathways as summarised by Rees et al. 2021 (Shoulder Elbow 13:5–11);
 * lumbar list after the IFOMPT framework, Finucane et al. 2020 (JOSPT 50:350–372). Flags are not diagnostic;
 * their absence does not exclude serious pathology.
 */
public enum RedFlag {
    SHOULDER_HOT_SWOLLEN_FEVER(Region.SHOULDER, RedFlagUrgency.EMERGENCY),
    SHOULDER_TRAUMA_LOST_ROTATION(Region.SHOULDER, RedFlagUrgency.EMERGENCY),
    SHOULDER_TRAUMA_WEAKNESS(Region.SHOULDER, RedFlagUrgency.URGENT),
    SHOULDER_MASS_CANCER_WEIGHT_LOSS_NIGHT_PAIN(Region.SHOULDER, RedFlagUrgency.URGENT),
    SHOULDER_SUDDEN_NEURO_LOSS(Region.SHOULDER, RedFlagUrgency.EMERGENCY),
    SHOULDER_BILATERAL_GIRDLE_HEADACHE_VISION(Region.SHOULDER, RedFlagUrgency.URGENT),
    SHOULDER_CHEST_OR_VISCERAL(Region.SHOULDER, RedFlagUrgency.SAME_DAY),
    LUMBAR_CAUDA_EQUINA(Region.LUMBOPELVIC, RedFlagUrgency.EMERGENCY),
    LUMBAR_MALIGNANCY(Region.LUMBOPELVIC, RedFlagUrgency.URGENT),
    LUMBAR_FRACTURE(Region.LUMBOPELVIC, RedFlagUrgency.URGENT),
    LUMBAR_INFECTION(Region.LUMBOPELVIC, RedFlagUrgency.URGENT);

    private final Region region;
    private final RedFlagUrgency urgency;

    RedFlag(Region region, RedFlagUrgency urgency) {
        this.region = region;
        this.urgency = urgency;
    }

    public Region region() {
        return region;
    }

    public RedFlagUrgency urgency() {
        return urgency;
    }
}
