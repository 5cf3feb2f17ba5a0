package org.swingclearance.audit;

import org.springframework.boot.context.properties.EnableConfigurationProperties;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.springframework.scheduling.annotation.EnableScheduling;
import org.swingclearance.web.NavEntry;

/** The audit feature's settings, its scheduled checkpoint job and its entry in the manager's navigation. */
@Configuration
@EnableScheduling
@EnableConfigurationProperties(AuditSettings.class)
class AuditConfig {

    @Bean
    NavEntry auditNavEntry() {
        return new NavEntry("nav.audit", "/audit", java.util.Set.of("MANAGER"), 50);
    }
}
