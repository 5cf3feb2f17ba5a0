package org.swingclearance.identity;

import java.sql.Timestamp;
import java.time.Clock;
import java.time.Instant;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;
import org.springframework.transaction.annotation.Propagation;
import org.springframework.transaction.annotation.Transactional;

/**
 * Counts failed sign-ins per account and per client address in a sliding window, in the database so that
 * every application node sees the same counts. A successful sign-in clears the account's failures.
 */
@Component
public class LoginThrottle {

    private final JdbcTemplate jdbc;
    private final ThrottleSettings settings;
    private final Clock clock;

    LoginThrottle(JdbcTemplate jdbc, ThrottleSettings settings, Clock clock) {
        this.jdbc = jdbc;
        this.settings = settings;
        this.clock = clock;
    }

    /** True while the account or the address has used up its failures in the window. */
    @Transactional(readOnly = true)
    public boolean isBlocked(String username, String clientAddress) {
        Timestamp since = Timestamp.from(clock.instant().minus(settings.window()));
        Integer byAccount = jdbc.queryForObject(
                "select count(*) from login_failure where lower(username) = lower(?) and occurred_at > ?",
                Integer.class, username, since);
        if (byAccount != null && byAccount >= settings.accountFailures()) {
            return true;
        }
        Integer byAddress = jdbc.queryForObject(
                "select count(*) from login_failure where client_address = ? and occurred_at > ?",
                Integer.class, clientAddress, since);
        return byAddress != null && byAddress >= settings.addressFailures();
    }

    @Transactional(propagation = Propagation.REQUIRES_NEW)
    public void recordFailure(String username, String clientAddress) {
        jdbc.update("insert into login_failure (username, client_address, occurred_at) values (?, ?, ?)",
                truncate(username), clientAddress, Timestamp.from(Instant.now(clock)));
    }

    @Transactional(propagation = Propagation.REQUIRES_NEW)
    public void recordSuccess(String username) {
        jdbc.update("delete from login_failure where lower(username) = lower(?)", username);
    }

    private static String truncate(String username) {
        String name = username == null ? "" : username;
        return name.length() > 254 ? name.substring(0, 254) : name;
    }
}
