package org.swingclearance.training;

import java.time.Instant;
import java.time.LocalDate;
import java.util.UUID;

/**
 * The latest version of one logged session as pages show it, with its next-morning pain (null until entered),
 * its session load (AU) and mechanical dose from the load engine (dose null when the configuration's demand ratio
 * is not known), and whether the viewer may correct it.
 */
public record SessionView(UUID logId, int version, UUID createdBy, LocalDate date, int planVersion, int stepNumber,
                          boolean asPlanned, SwingConfiguration done, SwingConfiguration planned, Double demandRatio,
                          int durationMin, int rpe, int painBefore, int painDuring, Integer painNextMorning,
                          int morningVersion,
                          String notes, String reason, Instant recordedAt, double sessionLoadAu, Double mechanicalDose,
                          boolean mayCorrect) {

    /** Corrected at least once. */
    public boolean corrected() {
        return version > 1;
    }

    /** The next day has come, so a next-morning rating can be entered. */
    public boolean morningDue(LocalDate today) {
        return today.isAfter(date);
    }
}
