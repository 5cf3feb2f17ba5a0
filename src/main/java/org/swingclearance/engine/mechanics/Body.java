package org.swingclearance.engine.mechanics;

/**
 * The patient's arm as a straight rigid segment hinged at the shoulder (engine.md §1).
 *
 * <p>Segment lengths are fractions of stature (Drillis &amp; Contini 1966 as drawn in Winter 2009 Fig. 4.1);
 * arm mass, centre of mass and inertia come from the Dempster "total arm" row of Winter 2009 Table 4.1,
 * whose length runs from the glenohumeral joint to the ulnar styloid (not to the fingertip).
 *
 * @param statureM               stature H in metres, [{@value #MIN_STATURE_M}, {@value #MAX_STATURE_M}]
 * @param massKg                 body mass M in kilograms, [{@value #MIN_MASS_KG}, {@value #MAX_MASS_KG}]
 * @param measuredShoulderToGripM measured shoulder-to-grip distance R_g in metres (shoulder joint centre to the
 *                               centre of the fist, arm straight), [{@value #MIN_SHOULDER_TO_GRIP_M},
 *                               {@value #MAX_SHOULDER_TO_GRIP_M}]; {@code null} when not measured, in which
 *                               case 0.386·H is used and labelled "estimated from stature"
 */
public record Body(double statureM, double massKg, Double measuredShoulderToGripM) {

    public static final double MIN_STATURE_M = 1.0;
    public static final double MAX_STATURE_M = 2.5;
    public static final double MIN_MASS_KG = 20.0;
    public static final double MAX_MASS_KG = 300.0;
    public static final double MIN_SHOULDER_TO_GRIP_M = 0.3;
    public static final double MAX_SHOULDER_TO_GRIP_M = 1.2;

    /** Upper arm, forearm and hand (wrist to fingertip) as fractions of stature (Winter Fig. 4.1). */
    static final double UPPER_ARM_FRACTION = 0.186;
    static final double FOREARM_FRACTION = 0.146;
    static final double HAND_FRACTION = 0.108;
    /** Dempster total arm (Winter Table 4.1): mass fraction, COM from proximal end, radius of gyration there. */
    static final double ARM_MASS_FRACTION = 0.050;
    static final double ARM_COM_FRACTION = 0.530;
    static final double ARM_GYRATION_PROXIMAL = 0.645;

    public Body {
        Checks.inRange("stature (m)", statureM, MIN_STATURE_M, MAX_STATURE_M);
        Checks.inRange("body mass (kg)", massKg, MIN_MASS_KG, MAX_MASS_KG);
        if (measuredShoulderToGripM != null) {
            Checks.inRange("shoulder-to-grip distance (m)", measuredShoulderToGripM,
                    MIN_SHOULDER_TO_GRIP_M, MAX_SHOULDER_TO_GRIP_M);
        }
    }

    /** A body whose shoulder-to-grip distance is estimated from stature. */
    public static Body of(double statureM, double massKg) {
        return new Body(statureM, massKg, null);
    }

    /** Upper-arm length 0.186·H, m (shoulder to elbow). */
    public double upperArmLengthM() {
        return UPPER_ARM_FRACTION * statureM;
    }

    /** Forearm length 0.146·H, m (elbow to wrist). */
    public double forearmLengthM() {
        return FOREARM_FRACTION * statureM;
    }

    /** Hand length 0.108·H, m (wrist to fingertip). */
    public double handLengthM() {
        return HAND_FRACTION * statureM;
    }

    /** Total-arm length L_arm = upper arm + forearm, m (glenohumeral joint to ulnar styloid). */
    public double armLengthM() {
        return (UPPER_ARM_FRACTION + FOREARM_FRACTION) * statureM;
    }

    /** Arm mass m_arm = 0.050·M, kg (includes the hand). */
    public double armMassKg() {
        return ARM_MASS_FRACTION * massKg;
    }

    /** Distance r_arm from the shoulder to the arm's centre of mass, 0.530·L_arm, m. */
    public double armComFromShoulderM() {
        return ARM_COM_FRACTION * armLengthM();
    }

    /** Arm inertia about the shoulder, m_arm·(0.645·L_arm)², kg·m². */
    public double armInertiaAboutShoulderKgM2() {
        double radius = ARM_GYRATION_PROXIMAL * armLengthM();
        return armMassKg() * radius * radius;
    }

    /** Arm first moment about the shoulder, m_arm·r_arm, kg·m. */
    public double armFirstMomentKgM() {
        return armMassKg() * armComFromShoulderM();
    }

    /** Shoulder-to-grip distance R_g, m: the measured value when given, else (0.186 + 0.146 + 0.054)·H. */
    public double shoulderToGripM() {
        return measuredShoulderToGripM != null ? measuredShoulderToGripM
                : (UPPER_ARM_FRACTION + FOREARM_FRACTION + 0.5 * HAND_FRACTION) * statureM;
    }

    /** Whether {@link #shoulderToGripM()} was measured or estimated. */
    public ShoulderToGripSource shoulderToGripSource() {
        return measuredShoulderToGripM != null ? ShoulderToGripSource.MEASURED
                : ShoulderToGripSource.ESTIMATED_FROM_STATURE;
    }
}
