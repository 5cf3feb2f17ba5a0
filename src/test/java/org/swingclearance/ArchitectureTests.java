package org.swingclearance;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;
import jakarta.persistence.Entity;
import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.OffsetDateTime;
import java.time.ZonedDateTime;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.RestController;

/**
 * The architecture rules of architecture.md: a pure, deterministic engine; thin web packages that never see
 * entities; package-private controllers inside web packages.
 */
@AnalyzeClasses(packages = "org.swingclearance", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTests {

    @ArchTest
    static final ArchRule engineIsPureJava = classes().that().resideInAPackage("org.swingclearance.engine..")
            .should().onlyDependOnClassesThat().resideInAnyPackage("org.swingclearance.engine..", "java..")
            .because("limits and plans must be computable and testable without Spring, JPA or a database");

    @ArchTest
    static final ArchRule engineHasNoFrameworks = noClasses().that().resideInAPackage("org.swingclearance.engine..")
            .should().dependOnClassesThat().resideInAnyPackage("org.springframework..", "jakarta..", "javax..",
                    "org.hibernate..", "tools.jackson..", "com.fasterxml..")
            .because("the engine is plain Java so it can be reused and tested exhaustively");

    @ArchTest
    static final ArchRule engineDoesNotReadTheClock = noClasses().that()
            .resideInAPackage("org.swingclearance.engine..")
            .should().callMethod(LocalDate.class, "now")
            .orShould().callMethod(LocalDateTime.class, "now")
            .orShould().callMethod(LocalTime.class, "now")
            .orShould().callMethod(Instant.class, "now")
            .orShould().callMethod(ZonedDateTime.class, "now")
            .orShould().callMethod(OffsetDateTime.class, "now")
            .orShould().callMethod(Clock.class, "systemUTC")
            .orShould().callMethod(Clock.class, "systemDefaultZone")
            .orShould().callMethod(System.class, "currentTimeMillis")
            .because("a result must depend only on its inputs: dates are passed in, never read");

    @ArchTest
    static final ArchRule controllersArePackagePrivateInWebPackages = classes().that()
            .areAnnotatedWith(Controller.class).or().areAnnotatedWith(RestController.class)
            .should().resideInAPackage("..web..").andShould().bePackagePrivate()
            .because("controllers are entry points, not API for other packages");

    @ArchTest
    static final ArchRule webDoesNotSeeEntities = noClasses().that().resideInAPackage("..web..")
            .should().dependOnClassesThat().areAnnotatedWith(Entity.class)
            .because("controllers bind form objects and views, never entities");
}
