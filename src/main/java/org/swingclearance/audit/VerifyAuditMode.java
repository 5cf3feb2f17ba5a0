package org.swingclearance.audit;

import java.util.Arrays;
import java.util.Map;
import org.springframework.boot.EnvironmentPostProcessor;
import org.springframework.boot.SpringApplication;
import org.springframework.core.env.ConfigurableEnvironment;
import org.springframework.core.env.MapPropertySource;

/**
 * When the command line asks for {@code verify-audit}, the application starts on a random port of the loopback
 * interface only (the security configuration needs a web application, but the run must not take the port of a
 * running instance nor be reachable from outside) and without the checkpoint job; it exits after the report.
 * Registered in META-INF/spring.factories.
 */
class VerifyAuditMode implements EnvironmentPostProcessor {

    @Override
    public void postProcessEnvironment(ConfigurableEnvironment environment, SpringApplication application) {
        String words = environment.getProperty("nonOptionArgs", "");
        if (Arrays.asList(words.split(",")).contains(VerifyAuditCommand.COMMAND)) {
            environment.getPropertySources().addFirst(new MapPropertySource("verify-audit", Map.of(
                    "server.port", "0",
                    "server.address", "127.0.0.1",
                    "clearance.audit.checkpoint-cron", "-")));
        }
    }
}
