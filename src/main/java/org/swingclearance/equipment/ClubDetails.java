package org.swingclearance.equipment;

/**
 * A club as entered, already in SI units (kg, m): what the service checks and stores. {@code headCentreM} is
 * optional except for the head-centre model; {@code pendulum} is required for, and only kept with, the pendulum.
 */
public record ClubDetails(String name, double massKg, double lengthM, double balancePointM, double handleLengthM,
                          Double headCentreM, InertiaMethod method, PendulumReading pendulum) {
}
