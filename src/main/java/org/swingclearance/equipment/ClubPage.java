package org.swingclearance.equipment;

import java.time.Instant;

/** A club's detail page: the club, how its inertia was found, and when it last changed. */
public record ClubPage(ClubView club, InertiaMethod method, PendulumReading pendulum, InertiaEstimate inertia,
                       long version, Instant updatedAt, Instant retiredAt) {
}
