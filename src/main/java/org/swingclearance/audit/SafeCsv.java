package org.swingclearance.audit;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * CSV for spreadsheets (RFC 4180 via Apache Commons CSV, UTF-8 with a byte-order mark so spreadsheet programs
 * read the encoding right). A cell starting with = + - @, a tab or a carriage return would be taken for a
 * formula; it gets a leading apostrophe (OWASP "CSV Injection" guidance), which spreadsheets show as text.
 */
public final class SafeCsv implements AutoCloseable {

    private static final char BYTE_ORDER_MARK = '\uFEFF';

    private final CSVPrinter printer;

    public SafeCsv(OutputStream out) {
        Writer writer = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        try {
            writer.write(BYTE_ORDER_MARK);
            this.printer = new CSVPrinter(writer, CSVFormat.RFC4180);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public void row(List<?> cells) {
        try {
            printer.printRecord(cells.stream().map(SafeCsv::neutralise).toList());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The cell as text that no spreadsheet evaluates. */
    public static String neutralise(Object cell) {
        if (cell == null) {
            return "";
        }
        String text = cell.toString();
        if (!text.isEmpty() && "=+-@\t\r".indexOf(text.charAt(0)) >= 0) {
            return "'" + text;
        }
        return text;
    }

    @Override
    public void close() {
        try {
            printer.close(true);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
