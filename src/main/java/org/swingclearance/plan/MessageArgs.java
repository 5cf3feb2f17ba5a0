package org.swingclearance.plan;

import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;

/**
 * The arguments of a stored message (a plan's outcome) in one text column, separated by the ASCII unit separator,
 * which no argument (numbers, club names, constraint codes) contains: control characters are dropped when storing.
 */
final class MessageArgs {

    private static final String SEPARATOR = "\u001F";

    private MessageArgs() {
    }

    static String join(List<String> args) {
        return args.isEmpty() ? null
                : args.stream().map(a -> a.replaceAll("\\p{Cntrl}", " ")).collect(Collectors.joining(SEPARATOR));
    }

    static List<String> split(String stored) {
        return stored == null || stored.isEmpty() ? List.of() : Arrays.asList(stored.split(SEPARATOR, -1));
    }
}
