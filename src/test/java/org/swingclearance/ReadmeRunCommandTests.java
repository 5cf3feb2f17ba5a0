package org.swingclearance;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/**
 * The README's run command works: {@code ./mvnw spring-boot:test-run} starts the application on the embedded
 * PostgreSQL with the demo clinic, {@code /actuator/health} answers UP and the demo clinician can sign in with the
 * documented default password. Runs the real command in a child process (its own data directory under target/).
 */
class ReadmeRunCommandTests {

    @Test
    @Timeout(value = 6, unit = java.util.concurrent.TimeUnit.MINUTES)
    void theRunCommandServesTheDemoClinic() throws Exception {
        int port;
        try (ServerSocket socket = new ServerSocket(0)) {
            port = socket.getLocalPort();
        }
        Path dataDir = Path.of("target", "run-command-postgres").toAbsolutePath();
        deleteRecursively(dataDir); // a fresh server each run: the test checks start-up, not an old schema
        Path log = Path.of("target", "run-command.log").toAbsolutePath();
        Files.createDirectories(log.getParent());
        ProcessBuilder builder = new ProcessBuilder(List.of("./mvnw", "-B", "-q", "spring-boot:test-run",
                "-Dspring-boot.run.arguments=--server.port=" + port,
                "-Dspring-boot.run.jvmArguments=-Dclearance.embedded.data-dir=" + dataDir))
                .redirectErrorStream(true).redirectOutput(log.toFile());
        Process process = builder.start();
        try {
            HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(2))
                    .followRedirects(HttpClient.Redirect.NEVER).build();
            String health = awaitHealth(http, port, process, log);
            assertThat(health).contains("\"status\":\"UP\"");
            assertThat(demoClinicianSignsIn(http, port)).isTrue();
        } finally {
            process.descendants().forEach(ProcessHandle::destroy);
            process.destroy();
            process.waitFor(30, java.util.concurrent.TimeUnit.SECONDS);
            process.descendants().forEach(ProcessHandle::destroyForcibly);
            process.destroyForcibly();
        }
    }

    private static String awaitHealth(HttpClient http, int port, Process process, Path log) throws Exception {
        Instant deadline = Instant.now().plus(Duration.ofMinutes(5));
        while (Instant.now().isBefore(deadline)) {
            if (!process.isAlive()) {
                throw new AssertionError("the run command ended early:\n" + tail(log));
            }
            try {
                HttpResponse<String> response = http.send(HttpRequest.newBuilder(
                        URI.create("http://127.0.0.1:" + port + "/actuator/health")).build(),
                        HttpResponse.BodyHandlers.ofString());
                if (response.statusCode() == 200) {
                    return response.body();
                }
            } catch (IOException notYet) {
                // the application is still starting
            }
            Thread.sleep(1000);
        }
        throw new AssertionError("no healthy application within 5 minutes:\n" + tail(log));
    }

    /** Signs in as the demo clinician with the default demo password (README) and expects the home page. */
    private static boolean demoClinicianSignsIn(HttpClient http, int port) throws Exception {
        HttpResponse<String> loginPage = http.send(HttpRequest.newBuilder(
                URI.create("http://127.0.0.1:" + port + "/login")).build(), HttpResponse.BodyHandlers.ofString());
        Matcher csrf = Pattern.compile("name=\"_csrf\" value=\"([^\"]+)\"").matcher(loginPage.body());
        assertThat(csrf.find()).isTrue();
        String cookie = loginPage.headers().firstValue("Set-Cookie").orElseThrow().split(";")[0];
        String form = "username=clinician%40demo.local&password=swing-clearance-demo&_csrf="
                + java.net.URLEncoder.encode(csrf.group(1), java.nio.charset.StandardCharsets.UTF_8);
        HttpResponse<String> signIn = http.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + "/login"))
                .header("Content-Type", "application/x-www-form-urlencoded").header("Cookie", cookie)
                .POST(HttpRequest.BodyPublishers.ofString(form)).build(), HttpResponse.BodyHandlers.ofString());
        return signIn.statusCode() == 302 && signIn.headers().firstValue("Location").orElse("").endsWith("/");
    }

    private static void deleteRecursively(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (var paths = Files.walk(dir)) {
            for (Path p : paths.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }

    private static String tail(Path log) throws IOException {
        List<String> lines = Files.readAllLines(log);
        return String.join("\n", lines.subList(Math.max(0, lines.size() - 60), lines.size()));
    }
}
