package org.swingclearance.equipment;

import java.util.UUID;

/**
 * A club as other features see it (Contract E). Lengths are metres from the knob end, mass kilograms; the inertia
 * about the balance point is always present, its source is MEASURED, MODELLED or BOUND.
 */
public record ClubView(UUID id, String name, double massKg, double lengthM, double balancePointM,
                       double handleLengthM, Double headCentreM, Double inertiaAboutBalancePointKgM2,
                       String inertiaSource, boolean retired) {
}
