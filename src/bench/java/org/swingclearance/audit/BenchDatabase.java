package org.swingclearance.audit;

import com.zaxxer.hikari.HikariConfig;
import com.zaxxer.hikari.HikariDataSource;
import org.flywaydb.core.Flyway;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.jdbc.datasource.DataSourceTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * The real PostgreSQL the audit benchmarks run on: TEST_DB_URL (user TEST_DB_USER/TEST_DB_PASSWORD, default
 * app/app), migrated with the project's own migrations, pooled as the application pools it.
 */
final class BenchDatabase implements AutoCloseable {

    final HikariDataSource dataSource;
    final JdbcTemplate jdbc;
    final DataSourceTransactionManager transactions;
    final TransactionTemplate tx;

    BenchDatabase(int poolSize) {
        HikariConfig config = new HikariConfig();
        config.setJdbcUrl(env("TEST_DB_URL", "jdbc:postgresql://127.0.0.1:5432/app_test"));
        config.setUsername(env("TEST_DB_USER", "app"));
        config.setPassword(env("TEST_DB_PASSWORD", "app"));
        config.setMaximumPoolSize(poolSize);
        dataSource = new HikariDataSource(config);
        Flyway.configure().dataSource(dataSource).locations("filesystem:db-migrations").load().migrate();
        jdbc = new JdbcTemplate(dataSource);
        transactions = new DataSourceTransactionManager(dataSource);
        tx = new TransactionTemplate(transactions);
    }

    private static String env(String name, String fallback) {
        String value = System.getenv(name);
        return value == null || value.isBlank() ? fallback : value;
    }

    @Override
    public void close() {
        dataSource.close();
    }
}
