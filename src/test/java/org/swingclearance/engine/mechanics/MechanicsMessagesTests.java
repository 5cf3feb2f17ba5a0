package org.swingclearance.engine.mechanics;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import org.junit.jupiter.api.Test;
import org.swingclearance.engine.envelope.LimitStatus;

/** Every mechanics enum the envelope and plan pages show has a label in the engine bundle (EnumName.CONSTANT). */
class MechanicsMessagesTests {

    @Test
    void everyDisplayedMechanicsEnumHasALabel() throws IOException {
        Properties messages = new Properties();
        try (InputStream in = getClass().getResourceAsStream("/messages/engine.properties")) {
            messages.load(new InputStreamReader(in, StandardCharsets.UTF_8));
        }
        List<String> missing = new ArrayList<>();
        for (Class<? extends Enum<?>> type : List.of(InertiaSource.class, ShoulderToGripSource.class,
                SwingKind.class, Constraint.class, LimitStatus.class)) {
            for (Enum<?> constant : type.getEnumConstants()) {
                String key = type.getSimpleName() + "." + constant.name();
                if (messages.getProperty(key, "").isBlank()) {
                    missing.add(key);
                }
            }
        }
        assertThat(missing).isEmpty();
    }
}
