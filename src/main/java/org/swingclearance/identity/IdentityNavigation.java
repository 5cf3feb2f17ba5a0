package org.swingclearance.identity;

import java.util.Set;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.swingclearance.web.NavEntry;

/** The identity feature's navigation entries: staff accounts for administrators, own preferences for everyone. */
@Configuration
class IdentityNavigation {

    @Bean
    NavEntry staffNavEntry() {
        return new NavEntry("nav.staff", "/staff", Set.of("ADMIN"), 80);
    }

    @Bean
    NavEntry accountNavEntry() {
        return new NavEntry("nav.account", "/account", Set.of("CLINICIAN", "TRAINER", "MANAGER", "ADMIN"), 90);
    }
}
