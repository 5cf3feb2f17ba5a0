package org.swingclearance.plan;

import com.openhtmltopdf.extend.FSStream;
import com.openhtmltopdf.outputdevice.helper.ExternalResourceControlPriority;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import java.io.ByteArrayOutputStream;
import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import org.springframework.context.MessageSource;
import org.springframework.stereotype.Component;
import org.swingclearance.identity.Clinic;
import org.swingclearance.web.Units;
import org.thymeleaf.ITemplateEngine;
import org.thymeleaf.context.Context;

/**
 * Renders the PDF handout of an issued plan on the server: the Thymeleaf template {@code plan/handout} (well-formed
 * XHTML, as the HTML-to-PDF renderer needs) with the demand chart as an embedded PNG, converted by openhtmltopdf.
 * Resources come only from the classpath and data URIs: the renderer never fetches anything over the network.
 */
@Component
class HandoutRenderer {

    static final String TEMPLATE = "plan/handout";

    /** Unicode fonts tried in order (Debian paths); without one the PDF uses the built-in Latin fonts. */
    private static final List<String> FONT_FILES = List.of(
            "/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf",
            "/usr/share/fonts/truetype/liberation/LiberationSans-Regular.ttf");
    private static final List<String> BOLD_FONT_FILES = List.of(
            "/usr/share/fonts/truetype/dejavu/DejaVuSans-Bold.ttf",
            "/usr/share/fonts/truetype/liberation/LiberationSans-Bold.ttf");

    private final ITemplateEngine templates;
    private final MessageSource messages;
    private final Units units;

    HandoutRenderer(ITemplateEngine templates, MessageSource messages, Units units) {
        this.templates = templates;
        this.messages = messages;
        this.units = units;
    }

    /** The handout's HTML, before conversion (tests and the print preview read it). */
    String html(IssuedPlanView plan, Clinic clinic, LocalDate today, Locale locale) {
        Context context = new Context(locale);
        context.setVariable("plan", plan);
        context.setVariable("clinic", clinic);
        context.setVariable("today", today);
        context.setVariable("units", units);
        context.setVariable("chart", "data:image/png;base64," + Base64.getEncoder().encodeToString(chart(plan, locale)));
        return templates.process(TEMPLATE, context);
    }

    byte[] pdf(IssuedPlanView plan, Clinic clinic, LocalDate today, Locale locale) {
        String html = html(plan, clinic, today, locale);
        try (ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            PdfRendererBuilder builder = new PdfRendererBuilder();
            builder.useFastMode();
            builder.withHtmlContent(html, "classpath:/templates/plan/");
            builder.useProtocolsStreamImplementation(HandoutRenderer::classpathResource, "classpath");
            builder.useExternalResourceAccessControl((uri, type) -> uri.startsWith("classpath:")
                    || uri.startsWith("data:"), ExternalResourceControlPriority.RUN_BEFORE_RESOLVING_URI);
            useFont(builder, FONT_FILES, 400);
            useFont(builder, BOLD_FONT_FILES, 700);
            builder.withProducer(messages.getMessage("app.name", null, locale));
            builder.toStream(out);
            builder.run();
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("could not render the plan handout", e);
        }
    }

    private byte[] chart(IssuedPlanView plan, Locale locale) {
        return DemandChartImage.png(plan.steps(), plan.gateStep(), new DemandChartImage.Labels(
                messages.getMessage("plan.chart.yAxis", null, locale),
                messages.getMessage("plan.chart.xAxis", null, locale),
                messages.getMessage("plan.chart.bandLimit", null, locale),
                messages.getMessage("plan.chart.gate", null, locale)));
    }

    private static void useFont(PdfRendererBuilder builder, List<String> candidates, int weight) {
        candidates.stream().map(File::new).filter(File::canRead).findFirst().ifPresent(file ->
                builder.useFont(file, "Handout Sans", weight, PdfRendererBuilder.FontStyle.NORMAL, true));
    }

    private static FSStream classpathResource(String uri) {
        String path = uri.substring("classpath:".length()).replaceFirst("^/+", "");
        return new FSStream() {
            @Override
            public InputStream getStream() {
                return HandoutRenderer.class.getClassLoader().getResourceAsStream(path);
            }

            @Override
            public Reader getReader() {
                InputStream in = getStream();
                return in == null ? null : new InputStreamReader(in, StandardCharsets.UTF_8);
            }
        };
    }
}
