package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Spreadsheet formula injection: cells starting with = + - @ tab or carriage return are prefixed with an
 * apostrophe (OWASP "CSV Injection"), all other cells are written unchanged.
 */
class SafeCsvTests {

    @ParameterizedTest
    @ValueSource(strings = {"=1+1", "+1", "-2+3", "@SUM(A1)", "\tcmd", "\rcmd", "=HYPERLINK(\"http://x\")"})
    void formulaStartsGetAnApostrophe(String cell) {
        assertThat(SafeCsv.neutralise(cell)).isEqualTo("'" + cell);
    }

    @ParameterizedTest
    @ValueSource(strings = {"PATIENT_READ", "1+1", "a=b", "", "'quoted", " =space first"})
    void otherCellsAreUnchanged(String cell) {
        assertThat(SafeCsv.neutralise(cell)).isEqualTo(cell);
    }

    @Test
    void writesRfc4180WithAByteOrderMark() {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (SafeCsv csv = new SafeCsv(out)) {
            csv.row(List.of("a", "b,c"));
            csv.row(java.util.Arrays.asList("=x", null, "say \"hi\""));
        }
        assertThat(out.toString(StandardCharsets.UTF_8)).isEqualTo("\uFEFFa,\"b,c\"\r\n'=x,,\"say \"\"hi\"\"\"\r\n");
    }
}
