package org.swingclearance.equipment;

import java.util.Set;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.swingclearance.web.NavEntry;

/** The equipment feature's entries in the main navigation: the club inventory and the swing pattern library. */
@Configuration
class EquipmentNavigation {

    @Bean
    NavEntry clubsNavEntry() {
        return new NavEntry("nav.clubs", "/clubs", Set.of("CLINICIAN", "MANAGER", "ADMIN"), 40);
    }

    @Bean
    NavEntry patternsNavEntry() {
        return new NavEntry("nav.patterns", "/patterns", Set.of("CLINICIAN", "MANAGER", "ADMIN"), 41);
    }
}
