package org.swingclearance.engine.mechanics;

/** The constraints a configuration must meet to be permitted (engine.md §5). */
public enum Constraint {
    /** C1: peak shoulder torque ≤ f·τ_cap. */
    SHOULDER_TORQUE("C1"),
    /** C2: hold torque ≤ f·τ_cap (practice rule "controlled stop"). */
    HOLD_TORQUE("C2"),
    /** C3: peak grip pull ≤ f_grip·G·g. */
    GRIP_PULL("C3"),
    /** C4: θ_c + A ≤ measured active shoulder flexion − margin; a gate on the pattern, not a load. */
    RANGE_OF_MOTION("C4"),
    /** C5: hip-driven patterns need the lumbopelvic band the rules name; a gate on the pattern, not a load. */
    HIP_DRIVE("C5");

    private final String code;

    Constraint(String code) {
        this.code = code;
    }

    /** The constraint's code in engine.md, C1 … C5. */
    public String code() {
        return code;
    }

    /** Whether this constraint compares a load with a capacity (C1–C3), rather than gating the pattern. */
    public boolean isLoad() {
        return this == SHOULDER_TORQUE || this == HOLD_TORQUE || this == GRIP_PULL;
    }
}
