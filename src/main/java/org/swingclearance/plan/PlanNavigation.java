package org.swingclearance.plan;

import java.util.Set;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.swingclearance.web.NavEntry;

/** The plan feature's entry in the main navigation: the trainer's shared plans. */
@Configuration
class PlanNavigation {

    @Bean
    NavEntry sharedPlansNavEntry() {
        return new NavEntry("nav.plans", "/plans", Set.of("TRAINER"), 20);
    }
}
