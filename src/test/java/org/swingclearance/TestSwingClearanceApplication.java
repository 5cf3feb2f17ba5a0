package org.swingclearance;

import io.zonky.test.db.postgres.embedded.EmbeddedPostgres;
import java.io.IOException;
import java.nio.file.Path;
import javax.sql.DataSource;
import org.springframework.boot.SpringApplication;
import org.springframework.boot.jdbc.DataSourceBuilder;
import org.springframework.boot.test.context.TestConfiguration;
import org.springframework.context.annotation.Bean;

/**
 * {@code ./mvnw spring-boot:test-run}: the application on an embedded PostgreSQL (real server binaries from a
 * Maven artifact) with the demo clinic. The data directory {@code .local-data/postgres} (system property
 * {@code clearance.embedded.data-dir}) is kept between runs; delete it to start afresh. Nothing to install but a JDK.
 */
public class TestSwingClearanceApplication {

    public static void main(String[] args) {
        SpringApplication.from(SwingClearanceApplication::main)
                .with(EmbeddedPostgresConfig.class)
                .withAdditionalProfiles("demo")
                .run(args);
    }

    /** Starts the embedded server before the data source needs it and stops it with the application. */
    @TestConfiguration(proxyBeanMethods = false)
    static class EmbeddedPostgresConfig {

        @Bean(destroyMethod = "close")
        EmbeddedPostgres embeddedPostgres() throws IOException {
            return EmbeddedPostgres.builder()
                    .setDataDirectory(Path.of(System.getProperty("clearance.embedded.data-dir", ".local-data/postgres")).toAbsolutePath())
                    .setCleanDataDirectory(false)
                    .setPort(Integer.parseInt(System.getProperty("clearance.embedded.port", "0")))
                    .start();
        }

        @Bean
        DataSource dataSource(EmbeddedPostgres postgres) {
            return DataSourceBuilder.create()
                    .url(postgres.getJdbcUrl("postgres", "postgres"))
                    .username("postgres")
                    .password("postgres")
                    .build();
        }
    }
}
