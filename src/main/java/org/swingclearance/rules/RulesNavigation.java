package org.swingclearance.rules;

import java.util.Set;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.swingclearance.web.NavEntry;

/** The practice-rules item of the main navigation, for the roles that edit the rules. */
@Configuration
class RulesNavigation {

    @Bean
    NavEntry practiceRulesNavEntry() {
        return new NavEntry("nav.rules", "/rules", Set.of("MANAGER", "ADMIN"), 60);
    }
}
