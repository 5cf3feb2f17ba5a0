package org.swingclearance.support;

import org.springframework.context.annotation.Import;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;
import org.testcontainers.DockerClientFactory;
import org.testcontainers.postgresql.PostgreSQLContainer;

/**
 * Every database test runs on real PostgreSQL, never an in-memory substitute: {@code TEST_DB_URL} if set, else a
 * Testcontainers container where Docker runs, else the local server at 127.0.0.1:5432 (database app_test, which
 * {@code .ci/run} prepares). Flyway cleans and migrates once per Spring context.
 */
@Import(CleanMigrateConfig.class)
public abstract class PostgresTestBase {

    private static final PostgreSQLContainer CONTAINER = startContainerIfUseful();

    private static PostgreSQLContainer startContainerIfUseful() {
        if (System.getenv("TEST_DB_URL") != null || !DockerClientFactory.instance().isDockerAvailable()) {
            return null;
        }
        PostgreSQLContainer container = new PostgreSQLContainer("postgres:15-alpine");
        container.start();
        return container;
    }

    @DynamicPropertySource
    static void database(DynamicPropertyRegistry registry) {
        if (CONTAINER != null) {
            registry.add("spring.datasource.url", CONTAINER::getJdbcUrl);
            registry.add("spring.datasource.username", CONTAINER::getUsername);
            registry.add("spring.datasource.password", CONTAINER::getPassword);
        } else {
            registry.add("spring.datasource.url",
                    () -> env("TEST_DB_URL", "jdbc:postgresql://127.0.0.1:5432/app_test"));
            registry.add("spring.datasource.username", () -> env("TEST_DB_USER", "app"));
            registry.add("spring.datasource.password", () -> env("TEST_DB_PASSWORD", "app"));
        }
        registry.add("spring.flyway.clean-disabled", () -> "false");
    }

    private static String env(String name, String fallback) {
        String value = System.getenv(name);
        return value == null || value.isBlank() ? fallback : value;
    }
}
