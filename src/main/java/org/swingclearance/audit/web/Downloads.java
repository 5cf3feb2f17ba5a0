package org.swingclearance.audit.web;

import jakarta.servlet.http.HttpServletResponse;
import java.time.Clock;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;

/**
 * Response headers of a file download. The file name is made here from fixed words and the time, never from
 * request input, so no header injection or path trick can come in through it.
 */
final class Downloads {

    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss")
            .withZone(ZoneOffset.UTC);

    private Downloads() {
    }

    static void attachment(HttpServletResponse response, String stem, String extension, String contentType,
                           Clock clock) {
        String name = stem + "-" + STAMP.format(clock.instant()) + "Z." + extension;
        response.setContentType(contentType);
        response.setHeader(HttpHeaders.CONTENT_DISPOSITION, ContentDisposition.attachment().filename(name).build()
                .toString());
        response.setHeader(HttpHeaders.CACHE_CONTROL, "no-store");
    }
}
