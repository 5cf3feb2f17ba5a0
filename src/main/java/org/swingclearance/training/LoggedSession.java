package org.swingclearance.training;

import java.time.LocalDate;

/** The latest version of a logged session with its latest next-morning pain (null until entered). */
record LoggedSession(SessionLogVersion version, Integer painNextMorning) {

    LocalDate date() {
        return version.getSessionDate();
    }
}
