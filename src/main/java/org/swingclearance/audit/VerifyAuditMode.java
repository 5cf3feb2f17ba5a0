package org.swingclearance.audit;

import java.util.Arrays;
import java.util.Map;
import org.springframework.boot.EnvironmentPostProcessor;
import org.springframework.boot.SpringApplication;
import org.springframework.core.env.ConfigurableEnvironment;
import org.springframework.core.env.MapPropertySource;

/**
 * Starts the application without its web server, scheduler-free, when the command line asks for
 * {@code verify-audit}: the verification must not take the port of a running instance or start serving pages.
 * Registered in META-INF/spring.factories.
 */
class VerifyAuditMode implements EnvironmentPostProcessor {

    @Override
    public void postProcessEnvironment(ConfigurableEnvironment environment, SpringApplication application) {
        String words = environment.getProperty("nonOptionArgs", "");
        if (Arrays.asList(words.split(",")).contains(VerifyAuditCommand.COMMAND)) {
            environment.getPropertySources().addFirst(new MapPropertySource("verify-audit", Map.of(
                    "spring.main.web-application-type", "none",
                    "clearance.audit.checkpoint-cron", "-")));
        }
    }
}
