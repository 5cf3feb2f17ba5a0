package org.swingclearance.engine.rules;

import java.util.Collection;
import java.util.Objects;
import java.util.Optional;

/** What a set of present red flags means for the screening: whether it forces Hold and how urgent referral is. */
public final class RedFlags {

    private RedFlags() {
    }

    /** True when any flag is present; then every band is Hold and no plan may be generated. */
    public static boolean forceHold(Collection<RedFlag> present) {
        return !Objects.requireNonNull(present, "present").isEmpty();
    }

    /** The most urgent referral among the present flags; empty when none is present. */
    public static Optional<RedFlag.Urgency> mostUrgent(Collection<RedFlag> present) {
        return Objects.requireNonNull(present, "present").stream().map(RedFlag::urgency).min(Enum::compareTo);
    }
}
