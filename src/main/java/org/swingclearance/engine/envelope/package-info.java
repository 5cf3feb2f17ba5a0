/**
 * The envelope of engine.md §6: for one club and pattern, the furthest grip from the head, the shortest cycle time
 * and the heaviest club mass that are still permitted, found by inverting the constraints of
 * {@link org.swingclearance.engine.mechanics.Assessor}. A limit with no permitted value in its range is reported
 * as not permissible, never clipped to the end of the range. Plain Java only; SI units.
 */
package org.swingclearance.engine.envelope;
