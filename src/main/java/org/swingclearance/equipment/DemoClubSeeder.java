package org.swingclearance.equipment;

import java.time.Clock;
import java.time.Instant;
import java.util.List;
import java.util.UUID;
import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.context.annotation.Profile;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;
import org.springframework.transaction.annotation.Transactional;
import org.swingclearance.demo.DemoIds;

/**
 * Seeds the invented demo clinic's clubs, 2 to 12 kg, after the clinics exist; each club has a fixed id, so a
 * second start adds nothing. The measurements are invented; the 6 kg club is the worked pendulum example of
 * biomechanics.md §3.2 (20 full swings in 28.0 s about the knob, 45 cm from the balance point).
 */
@Component
@Profile("demo")
@Order(DemoIds.ORDER_CLINICS + 40)
class DemoClubSeeder implements ApplicationRunner {

    private static final double CM = 0.01;

    /** The demo inventory; lengths in cm from the knob end. */
    private static final List<Seed> CLUBS = List.of(
            new Seed("00000000-0000-4000-8000-00000000c002", "Club 2 kg, short handle", 2, 50, 36, 18, 44.0, null),
            new Seed("00000000-0000-4000-8000-00000000c003", "Club 3 kg, long handle", 3, 66, 49, 28, 60.0, null),
            new Seed("00000000-0000-4000-8000-00000000c004", "Club 4 kg, long handle", 4, 70, 53, 30, 62.0, null),
            new Seed("00000000-0000-4000-8000-00000000c005", "Club 5 kg, short handle", 5, 56, 42, 20, 49.0, null),
            new Seed("00000000-0000-4000-8000-00000000c006", "Club 6 kg", 6, 60, 45, 22, 50.0,
                    new PendulumReading(45 * CM, 20, 28.0)),
            new Seed("00000000-0000-4000-8000-00000000c008", "Club 8 kg, long handle", 8, 72, 54, 30, 64.0, null),
            new Seed("00000000-0000-4000-8000-00000000c010", "Club 10 kg", 10, 65, 50, 24, null, null),
            new Seed("00000000-0000-4000-8000-00000000c012", "Club 12 kg, long handle", 12, 75, 58, 30, 66.0, null));

    private final ClubRepository clubs;
    private final Clock clock;

    DemoClubSeeder(ClubRepository clubs, Clock clock) {
        this.clubs = clubs;
        this.clock = clock;
    }

    @Override
    @Transactional
    public void run(ApplicationArguments args) {
        Instant now = clock.instant();
        for (Seed seed : CLUBS) {
            UUID id = UUID.fromString(seed.id());
            if (clubs.existsById(id)) {
                continue;
            }
            ClubDetails details = seed.details();
            Club club = new Club(id, DemoIds.CLINIC, now, DemoIds.CLINICIAN);
            club.apply(details, ClubMeasurements.check(details), now, DemoIds.CLINICIAN);
            clubs.save(club);
        }
    }

    /** One invented demo club: the head model when a head centre is given, the pendulum or else the bound. */
    private record Seed(String id, String name, double massKg, double lengthCm, double balanceCm, double handleCm,
                        Double headCentreCm, PendulumReading pendulum) {

        ClubDetails details() {
            InertiaMethod method = pendulum != null ? InertiaMethod.PENDULUM
                    : headCentreCm != null ? InertiaMethod.HEAD_MODEL : InertiaMethod.BOUND;
            return new ClubDetails(name, massKg, lengthCm * CM, balanceCm * CM, handleCm * CM,
                    headCentreCm == null ? null : headCentreCm * CM, method, pendulum);
        }
    }
}
