package org.swingclearance.engine.mechanics;

import java.util.ArrayList;
import java.util.List;

/** The plain sentences a demand result states about its model; chosen by the configuration, never computed. */
final class Assumptions {

    static final String FIXED_HINGE = "The shoulder is a fixed hinge: scapular, trunk and hip motion are ignored,"
            + " so all torque and work are attributed to the shoulder.";
    static final String STRAIGHT_ARM = "The arm is straight and rigid and the club lies along the arm line.";
    static final String PLANAR = "The swing is planar, in a vertical plane; paths around the head or in figures"
            + " of eight are treated as planar, so their results are indicative.";
    static final String PER_ARM = "Torques, forces and work are per arm, at the shoulder of the swinging arm.";
    static final String ARM_TABLES = "Arm mass, centre of mass and inertia come from population tables (Dempster"
            + " total arm via Winter Table 4.1), not from this patient.";
    static final String RHYTHMIC = "The arm angle follows a sine wave over the cycle (rhythmic swing).";
    static final String SINGLE_ARC = "Each arc runs from rest to rest in half the cycle time on a minimum-jerk"
            + " profile (Flash & Hogan 1985) and returns the same way.";
    static final String TWO_HANDS = "With two hands each arm is taken to carry half the club about its own"
            + " shoulder; the shoulders are not a common pivot, so this split is an approximation.";
    static final String REACH = "A reach factor below 1 shortens the shoulder-to-grip distance for a bent-elbow"
            + " arc; the elbow flexors' extra demand is not modelled.";
    static final String ESTIMATED_REACH = "The shoulder-to-grip distance is estimated from stature (0.386 ×"
            + " stature); it is the largest single uncertainty (about 8 % between models): measure it when possible.";
    static final String INERTIA_MEASURED = "The club's inertia about its balance point comes from a measurement.";
    static final String INERTIA_MODELLED = "The club's inertia about its balance point is modelled as a uniform rod"
            + " plus a point mass at the head centre.";
    static final String INERTIA_BOUND = "No inertia measurement and no usable head centre were given, so the club's"
            + " inertia is the safe upper bound m·x_cm·(L − x_cm): demand is overstated, never understated.";
    static final String NON_STANDARD_GRAVITY = "Gravity is taken as given by the caller, not the standard"
            + " 9.80665 m/s².";

    private Assumptions() {
    }

    /** The sentences that apply to this configuration, in a stable order. */
    static List<String> of(Configuration configuration) {
        List<String> sentences = new ArrayList<>(10);
        sentences.add(FIXED_HINGE);
        sentences.add(STRAIGHT_ARM);
        sentences.add(PLANAR);
        sentences.add(PER_ARM);
        sentences.add(ARM_TABLES);
        SwingPattern pattern = configuration.pattern();
        sentences.add(pattern.kind() == SwingKind.RHYTHMIC ? RHYTHMIC : SINGLE_ARC);
        if (pattern.hands() == 2) {
            sentences.add(TWO_HANDS);
        }
        if (pattern.reach() < 1.0) {
            sentences.add(REACH);
        }
        if (configuration.body().shoulderToGripSource() == ShoulderToGripSource.ESTIMATED_FROM_STATURE) {
            sentences.add(ESTIMATED_REACH);
        }
        sentences.add(switch (configuration.club().inertia().source()) {
            case MEASURED -> INERTIA_MEASURED;
            case MODELLED -> INERTIA_MODELLED;
            case BOUND -> INERTIA_BOUND;
        });
        if (configuration.gravity() != Gravity.STANDARD) {
            sentences.add(NON_STANDARD_GRAVITY);
        }
        return List.copyOf(sentences);
    }

    /** Where each estimated input came from. */
    static List<Provenance> provenance(Configuration configuration) {
        Body body = configuration.body();
        String reach = body.shoulderToGripSource() == ShoulderToGripSource.MEASURED
                ? "measured on the patient"
                : "estimated from stature: 0.386 × stature (Drillis & Contini via Winter Fig. 4.1)";
        InertiaSource source = configuration.club().inertia().source();
        String inertia = switch (source) {
            case MEASURED -> "measured (pendulum or direct measurement)";
            case MODELLED -> "modelled as a uniform rod plus a point mass at the head centre";
            case BOUND -> "safe upper bound m·x_cm·(L − x_cm)";
        };
        return List.of(
                new Provenance("shoulder-to-grip distance", reach),
                new Provenance("arm mass, centre of mass and inertia",
                        "estimated from body mass and stature: Dempster total arm via Winter Table 4.1"),
                new Provenance("club inertia about the balance point", inertia));
    }
}
