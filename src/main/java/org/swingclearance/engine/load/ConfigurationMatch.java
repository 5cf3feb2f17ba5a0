package org.swingclearance.engine.load;

/** How a logged session's configuration compares with the plan step it was logged against. */
public enum ConfigurationMatch {
    /** Done as prescribed. */
    AS_PLANNED,
    /** A different configuration with a lower demand ratio. */
    LIGHTER,
    /** A different configuration with a higher demand ratio: raises an alert. */
    HEAVIER,
    /** A different configuration with the same demand ratio. */
    DIFFERENT;

    /**
     * Classifies a logged configuration.
     *
     * @param sameConfiguration true when club, grip mark, cycle time and sets × reps are the step's
     * @param loggedDemand      demand ratio D of what was done, ≥ 0
     * @param stepDemand        demand ratio D of the step, ≥ 0
     */
    public static ConfigurationMatch compare(boolean sameConfiguration, double loggedDemand, double stepDemand) {
        Checks.nonNegative(loggedDemand, "logged demand");
        Checks.nonNegative(stepDemand, "step demand");
        if (sameConfiguration) {
            return AS_PLANNED;
        }
        if (loggedDemand > stepDemand) {
            return HEAVIER;
        }
        return loggedDemand < stepDemand ? LIGHTER : DIFFERENT;
    }
}
