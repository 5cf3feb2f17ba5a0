package org.swingclearance.identity;

import java.time.Duration;
import org.springframework.boot.context.properties.ConfigurationProperties;

/**
 * Sign-in throttling: how many failures in the window lock an account or a client address.
 * NIST SP 800-63B caps consecutive failures per account at 100; we stay far below that.
 */
@ConfigurationProperties("clearance.security.throttle")
public record ThrottleSettings(Duration window, int accountFailures, int addressFailures) {
}
