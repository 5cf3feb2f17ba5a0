package org.swingclearance.audit;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import org.springframework.core.env.Environment;

/**
 * A database superuser connection to the test database, as an attacker with full database access would have:
 * TEST_DB_ADMIN_USER / TEST_DB_ADMIN_PASSWORD, by default app_admin/app_admin as .ci/run creates it; with
 * Testcontainers the container's own user is already a superuser. Its session runs with
 * {@code session_replication_role = replica}, which switches ordinary triggers off, so the append-only
 * triggers no longer stop an UPDATE or DELETE.
 */
final class Superuser implements AutoCloseable {

    private final Connection connection;

    private Superuser(Connection connection) {
        this.connection = connection;
    }

    static Superuser connect(Environment env) throws SQLException {
        String url = env.getRequiredProperty("spring.datasource.url");
        String user = System.getenv().getOrDefault("TEST_DB_ADMIN_USER", "app_admin");
        String password = System.getenv().getOrDefault("TEST_DB_ADMIN_PASSWORD", "app_admin");
        Connection connection;
        try {
            connection = DriverManager.getConnection(url, user, password);
        } catch (SQLException noAdminRole) {
            connection = DriverManager.getConnection(url, env.getProperty("spring.datasource.username"),
                    env.getProperty("spring.datasource.password"));
        }
        try (var st = connection.createStatement()) {
            st.execute("set session_replication_role = replica");
        }
        return new Superuser(connection);
    }

    /** Runs one statement with positional parameters and returns the number of rows it touched. */
    int update(String sql, Object... args) throws SQLException {
        try (PreparedStatement st = connection.prepareStatement(sql)) {
            for (int i = 0; i < args.length; i++) {
                st.setObject(i + 1, args[i]);
            }
            return st.executeUpdate();
        }
    }

    Connection connection() {
        return connection;
    }

    @Override
    public void close() throws SQLException {
        connection.close();
    }
}
