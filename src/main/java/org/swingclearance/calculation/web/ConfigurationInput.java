package org.swingclearance.calculation.web;

import org.swingclearance.engine.mechanics.Configuration;
import org.swingclearance.engine.mechanics.Gravity;

/** The configuration fields both calculation requests share. */
interface ConfigurationInput {

    BodyInput body();

    ClubInput club();

    Double gripMarkM();

    PatternInput pattern();

    Double cycleTimeS();

    Double gravity();

    /** g as given, else standard gravity. */
    default double gravityOrStandard() {
        return gravity() != null ? gravity() : Gravity.STANDARD;
    }

    /** The engine's configuration; call only on a validated request. */
    default Configuration toConfiguration() {
        double g = gravityOrStandard();
        return new Configuration(body().toBody(), club().toClub(g), gripMarkM(), pattern().toPattern(), cycleTimeS(),
                g);
    }
}
