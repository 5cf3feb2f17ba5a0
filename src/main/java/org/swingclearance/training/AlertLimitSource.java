package org.swingclearance.training;

import java.util.UUID;

/** Where the alert limits come from: the clinic's current practice rules (the rules feature's Contract R). */
interface AlertLimitSource {

    AlertLimits current(UUID clinicId);
}
