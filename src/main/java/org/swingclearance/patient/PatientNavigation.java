package org.swingclearance.patient;

import java.util.Set;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import org.swingclearance.web.NavEntry;

/** The patient feature's entry in the main navigation. */
@Configuration
class PatientNavigation {

    @Bean
    NavEntry patientsNavEntry() {
        return new NavEntry("nav.patients", "/patients", Set.of("CLINICIAN"), 10);
    }
}
