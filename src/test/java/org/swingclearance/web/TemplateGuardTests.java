package org.swingclearance.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Guards every template: no unescaped output (th:utext, [( )]), no expression preprocessing outside the field
 * fragments (where it only receives our own field names), no inline scripts or styles (the CSP would block them),
 * and every literal message key exists in a message bundle.
 */
class TemplateGuardTests {

    private static final Path TEMPLATES = Path.of("src/main/resources/templates");
    private static final Path MESSAGES = Path.of("src/main/resources/messages");
    private static final Pattern LITERAL_KEY = Pattern.compile("#\\{([A-Za-z][\\w.]*)[(}]");

    private static List<Path> templates() throws IOException {
        try (Stream<Path> files = Files.walk(TEMPLATES)) {
            return files.filter(p -> p.toString().endsWith(".html")).toList();
        }
    }

    @Test
    void noUnescapedOutputAndNoPreprocessingOutsideTheFieldFragments() throws IOException {
        for (Path template : templates()) {
            String html = Files.readString(template);
            assertThat(html).as(template + " uses th:utext").doesNotContain("th:utext");
            assertThat(html).as(template + " uses unescaped inlining").doesNotContain("[(");
            if (!template.endsWith(Path.of("fragments", "forms.html"))) {
                assertThat(html).as(template + " uses preprocessing").doesNotContain("__${");
            }
        }
    }

    @Test
    void noInlineScriptsOrStyles() throws IOException {
        Pattern inlineScript = Pattern.compile("<script(?![^>]*\\bsrc=)(?![^>]*type=\"application/json\")[^>]*>");
        Pattern inlineHandler = Pattern.compile("\\son[a-z]+=\"");
        for (Path template : templates()) {
            String html = Files.readString(template);
            assertThat(inlineScript.matcher(html).find()).as(template + " has an inline script").isFalse();
            assertThat(inlineHandler.matcher(html).find()).as(template + " has an inline event handler").isFalse();
            assertThat(html).as(template + " has a style attribute").doesNotContain(" style=\"");
            assertThat(html).as(template + " has a style element").doesNotContain("<style");
        }
    }

    @Test
    void everyMessageBundleIsOnTheBasenameList() throws IOException {
        Properties app = new Properties();
        try (InputStream in = Files.newInputStream(Path.of("src/main/resources/application.properties"))) {
            app.load(in);
        }
        List<String> basenames = List.of(app.getProperty("spring.messages.basename").split(","));
        try (Stream<Path> files = Files.list(MESSAGES)) {
            files.map(p -> "messages/" + p.getFileName().toString().replace(".properties", ""))
                    .forEach(name -> assertThat(basenames).as("spring.messages.basename").contains(name));
        }
    }

    @Test
    void everyLiteralMessageKeyExists() throws IOException {
        Properties messages = new Properties();
        try (Stream<Path> files = Files.list(MESSAGES)) {
            for (Path file : files.filter(p -> p.toString().endsWith(".properties")).toList()) {
                try (InputStream in = Files.newInputStream(file)) {
                    Properties bundle = new Properties();
                    bundle.load(new java.io.InputStreamReader(in, StandardCharsets.UTF_8));
                    messages.putAll(bundle);
                }
            }
        }
        List<String> missing = new ArrayList<>();
        for (Path template : templates()) {
            Matcher m = LITERAL_KEY.matcher(Files.readString(template));
            while (m.find()) {
                if (!messages.containsKey(m.group(1))) {
                    missing.add(TEMPLATES.relativize(template) + ": " + m.group(1));
                }
            }
        }
        assertThat(missing).as("message keys used in templates but missing from the bundles").isEmpty();
    }
}
