/**
 * Swing mechanics: the body, the club and its inertia source, the swing pattern, the demand of one
 * configuration (shoulder torque, hold torque, grip pull, wrist moment, work), the patient's capacity and the
 * constraints C1–C5 that decide whether a configuration is permitted (engine.md §1–5).
 *
 * <p>Plain Java only; SI units inside (m, kg, s, rad, N, N·m, J), degrees only in factory methods named so.
 * No value is ever null unless its accessor says so. Every invalid input is refused with an
 * {@link java.lang.IllegalArgumentException} naming the quantity; nothing is clipped.
 * Check values: biomechanics.md §0.2–0.3, reproduced in {@code MechanicsCheckValueTests}.
 */
package org.swingclearance.engine.mechanics;
