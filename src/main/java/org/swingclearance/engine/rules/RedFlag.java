package org.swingclearance.engine.rules;

import org.swingclearance.engine.evidence.Citation;
import org.swingclearance.engine.evidence.Citations;

/**
 * The red-flag checklist re-checked at every screening (clinical.md §5), each with the region it belongs to, the
 * urgency of referral and its source. Any present flag forces Hold and blocks plans until a clinician records the
 * referral. Flags are not diagnostic; their absence does not exclude serious pathology.
 */
public enum RedFlag {
    /** Hot, red, swollen, acutely painful joint; fever or systemically unwell (suspected septic arthritis). */
    SHOULDER_SEPTIC_ARTHRITIS(Region.SHOULDER, Urgency.EMERGENCY, Citations.SHOULDER_RED_FLAGS),
    /** Trauma, seizure or electric shock with loss of rotation or abnormal contour (unreduced dislocation). */
    SHOULDER_UNREDUCED_DISLOCATION(Region.SHOULDER, Urgency.EMERGENCY, Citations.SHOULDER_RED_FLAGS),
    /** Trauma followed by pain and weakness, e.g. cannot elevate the arm (acute rotator cuff tear). */
    SHOULDER_ACUTE_CUFF_TEAR(Region.SHOULDER, Urgency.URGENT, Citations.SHOULDER_RED_FLAGS),
    /** New mass or swelling, history of cancer, unexplained weight loss, constant or night pain. */
    SHOULDER_MALIGNANCY(Region.SHOULDER, Urgency.URGENT, Citations.SHOULDER_RED_FLAGS),
    /** Sudden significant arm motor or sensory loss. */
    SHOULDER_NEUROLOGICAL_LOSS(Region.SHOULDER, Urgency.EMERGENCY, Citations.SHOULDER_RED_FLAGS),
    /** Bilateral girdle pain and stiffness, headache, visual symptoms; urgent when giant-cell arteritis is possible. */
    SHOULDER_INFLAMMATORY_DISEASE(Region.SHOULDER, Urgency.URGENT, Citations.CONDITIONAL_URGENCY),
    /** Shoulder pain with chest symptoms, an exertional pattern or shoulder-tip pain; emergency if cardiac. */
    SHOULDER_REFERRED_VISCERAL_PAIN(Region.SHOULDER, Urgency.EMERGENCY, Citations.CONDITIONAL_URGENCY),
    /** Bilateral leg symptoms, saddle sensory change, new bladder, bowel or sexual dysfunction, progressive deficit. */
    LUMBAR_CAUDA_EQUINA(Region.LUMBOPELVIC, Urgency.EMERGENCY, Citations.FINUCANE_2020),
    /** Past cancer, age over 50, unexplained weight loss, constant, progressive or night pain. */
    LUMBAR_MALIGNANCY(Region.LUMBOPELVIC, Urgency.URGENT, Citations.FINUCANE_2020),
    /** Significant trauma (or minor with osteoporosis), prolonged corticosteroids, older age. */
    LUMBAR_FRACTURE(Region.LUMBOPELVIC, Urgency.URGENT, Citations.FINUCANE_2020),
    /** Fever or systemically unwell, immunosuppression, IV drug use, recent infection or spinal procedure. */
    LUMBAR_INFECTION(Region.LUMBOPELVIC, Urgency.URGENT, Citations.FINUCANE_2020);

    /** How soon the patient must be referred. */
    public enum Urgency {
        /** Same day, emergency department or on-call team. */
        EMERGENCY,
        /** Urgent medical or specialist referral (next available clinic or suspected-cancer pathway). */
        URGENT
    }

    private final Region region;
    private final Urgency urgency;
    private final Citation source;

    RedFlag(Region region, Urgency urgency, Citation source) {
        this.region = region;
        this.urgency = urgency;
        this.source = source;
    }

    /** Region of the checklist the flag belongs to; never null. */
    public Region region() {
        return region;
    }

    /** Urgency of referral; never null. */
    public Urgency urgency() {
        return urgency;
    }

    /** Source of the flag and its urgency; never null. */
    public Citation source() {
        return source;
    }
}
