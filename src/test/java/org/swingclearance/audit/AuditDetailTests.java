package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.junit.jupiter.api.Test;

/** The detail text format reads back exactly what was written, whatever the reason text holds. */
class AuditDetailTests {

    @Test
    void pairsAreJoinedLikeTheExistingDetails() {
        assertThat(AuditDetail.of("role", "MANAGER", "enabled", true)).isEqualTo("role=MANAGER,enabled=true");
        assertThat(AuditDetail.of("trainer", null)).isNull();
    }

    @Test
    void commasEqualsSignsAndBackslashesInAReasonSurvive() {
        String reason = "Pain 6/10, keep at Band 1; a=b \\ c";
        String detail = AuditDetail.of("region", "SHOULDER", "reason", reason);
        assertThat(AuditDetail.parse(detail)).containsExactly(Map.entry("region", "SHOULDER"), Map.entry("reason", reason));
    }

    @Test
    void plainTextWithoutPairsIsKeptAsText() {
        assertThat(AuditDetail.parse("not in caller's clinic or missing"))
                .containsExactly(Map.entry("text", "not in caller's clinic or missing"));
        assertThat(AuditDetail.parse(null)).isEmpty();
    }

    /** Keys are our own identifiers; values are anything a person may type, including the separators. */
    @Property
    void anyValueRoundTrips(@ForAll String first, @ForAll String second) {
        Map<String, String> read = AuditDetail.parse(AuditDetail.of("region", first, "reason", second));
        assertThat(read).containsExactly(Map.entry("region", first), Map.entry("reason", second));
    }
}
