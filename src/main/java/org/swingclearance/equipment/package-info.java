/**
 * The clinic's equipment: the club inventory (mass, length, balance point, handle length and the club's inertia
 * with its provenance, including the guided pendulum measurement) and the swing patterns (a built-in library plus
 * each clinic's own). Other features read clubs and patterns through {@link org.swingclearance.equipment.Clubs}
 * and {@link org.swingclearance.equipment.SwingPatterns} (Contract E), never through the entities.
 */
package org.swingclearance.equipment;
