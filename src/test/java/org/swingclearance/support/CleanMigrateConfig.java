package org.swingclearance.support;

import org.flywaydb.core.Flyway;
import org.springframework.boot.flyway.autoconfigure.FlywayMigrationStrategy;
import org.springframework.boot.test.context.TestConfiguration;
import org.springframework.context.annotation.Bean;

/**
 * Clean + migrate for every test context: the local server keeps data between runs, so each context starts from an
 * empty schema built by the real migrations. Imported by {@link PostgresTestBase}.
 */
@TestConfiguration(proxyBeanMethods = false)
class CleanMigrateConfig {

    @Bean
    FlywayMigrationStrategy cleanMigrate() {
        return (Flyway flyway) -> {
            flyway.clean();
            flyway.migrate();
        };
    }
}
