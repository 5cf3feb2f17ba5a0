package org.swingclearance.engine.evidence;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import org.junit.jupiter.api.Test;
import org.swingclearance.engine.load.Alert;
import org.swingclearance.engine.load.ConfigurationMatch;
import org.swingclearance.engine.load.DayStatus;
import org.swingclearance.engine.load.PainDecision;
import org.swingclearance.engine.load.PainReason;
import org.swingclearance.engine.load.RatioStatus;
import org.swingclearance.engine.load.SdConvention;
import org.swingclearance.engine.load.WindowStatus;
import org.swingclearance.engine.rules.Comparison;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.rules.MissingValue;
import org.swingclearance.engine.rules.Region;
import org.swingclearance.engine.rules.RegionBand;
import org.swingclearance.engine.scoring.Grip;
import org.swingclearance.engine.scoring.Instrument;
import org.swingclearance.engine.scoring.Measure;
import org.swingclearance.engine.scoring.NotScorable;
import org.swingclearance.engine.scoring.OdiBand;
import org.swingclearance.engine.scoring.RotationBasis;
import org.swingclearance.engine.scoring.Sex;
import org.swingclearance.engine.scoring.Side;
import org.swingclearance.engine.scoring.Spadi;
import org.swingclearance.engine.scoring.ValueKey;

/** Every enum the screens show has a label in the engine bundle, keyed EnumName.CONSTANT (nested: Outer.Enum). */
class EngineMessagesTests {

    @Test
    void everyDisplayedEnumConstantHasALabel() throws IOException {
        Properties messages = new Properties();
        try (InputStream in = getClass().getResourceAsStream("/messages/engine.properties")) {
            messages.load(new InputStreamReader(in, StandardCharsets.UTF_8));
        }
        List<Class<? extends Enum<?>>> top = List.of(EvidenceTag.class, Confidence.class, Side.class, Sex.class,
                Region.class, LoadBand.class, Comparison.class, RotationBasis.class, OdiBand.class, Instrument.class,
                Measure.class, ValueKey.class, DayStatus.class, RatioStatus.class, WindowStatus.class,
                SdConvention.class, ConfigurationMatch.class);
        List<Class<? extends Enum<?>>> nested = List.of(RegionBand.Basis.class, MissingValue.Need.class,
                NotScorable.Reason.class, Spadi.TotalMethod.class, Grip.Protocol.class, PainDecision.Decision.class,
                PainReason.Kind.class, Alert.Kind.class);
        List<String> missing = new ArrayList<>();
        for (Class<? extends Enum<?>> type : top) {
            collectMissing(messages, type.getSimpleName(), type, missing);
        }
        for (Class<? extends Enum<?>> type : nested) {
            collectMissing(messages, type.getEnclosingClass().getSimpleName() + "." + type.getSimpleName(), type,
                    missing);
        }
        assertThat(missing).isEmpty();
    }

    private static void collectMissing(Properties messages, String prefix, Class<? extends Enum<?>> type,
            List<String> missing) {
        for (Enum<?> constant : type.getEnumConstants()) {
            String key = prefix + "." + constant.name();
            if (messages.getProperty(key, "").isBlank()) {
                missing.add(key);
            }
        }
    }
}
