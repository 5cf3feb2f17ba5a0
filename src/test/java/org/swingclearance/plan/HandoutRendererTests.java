package org.swingclearance.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.UUID;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.swingclearance.identity.Clinic;
import org.swingclearance.web.Units;
import org.thymeleaf.spring6.SpringTemplateEngine;
import org.thymeleaf.templatemode.TemplateMode;
import org.thymeleaf.templateresolver.ClassLoaderTemplateResolver;

/**
 * The PDF handout, rendered from the real template with a plan the engine computed (CASE-M80 body, provisional
 * continuation so the plan has a re-screen gate): a valid PDF whose text holds every step, the stop-and-regress
 * rules, the gate, the clinic's contact and the caution.
 */
class HandoutRendererTests {

    static HandoutRenderer renderer() {
        ClassLoaderTemplateResolver resolver = new ClassLoaderTemplateResolver();
        resolver.setPrefix("templates/");
        resolver.setSuffix(".html");
        resolver.setTemplateMode(TemplateMode.HTML);
        resolver.setCharacterEncoding("UTF-8");
        SpringTemplateEngine engine = new SpringTemplateEngine();
        engine.setTemplateResolver(resolver);
        engine.setTemplateEngineMessageSource(PlanComputationTests.messages());
        return new HandoutRenderer(engine, PlanComputationTests.messages(), new Units());
    }

    static IssuedPlanView plan() {
        PlanComputation.Computed computed = PlanComputation.compute(
                PlanComputationTests.inputs(PlanComputationTests.INVENTORY, 0.60),
                PlanComputationTests.settings(null, true), List.of(), 0.10, 5);
        List<PlanStepView> steps = computed.steps().stream().map(PlanStepView::of).toList();
        Integer gate = computed.steps().stream().filter(PlannedStep::isGateBefore).map(PlannedStep::getNumber)
                .findFirst().orElse(null);
        return new IssuedPlanView(UUID.randomUUID(), 2, UUID.randomUUID(), UUID.randomUUID(), "Zoë Example (T-001)",
                steps, gate, "one-hand front pendulum", "BAND_2", StepUnit.SESSIONS, 3, 3, LocalDate.of(2027, 3, 1),
                5, 0.10, Instant.parse("2027-02-27T10:15:00Z"), "Robin Example", "ab".repeat(32));
    }

    static Clinic clinic() {
        Clinic clinic = new Clinic(UUID.randomUUID(), "Example Partner Clinic", Instant.now());
        clinic.setContact("+00 000 000 123", "desk@example.invalid", "1 Sample Yard, Example Town");
        return clinic;
    }

    @Test
    void theHandoutIsAValidPdfWithTheStepsRulesGateContactAndCaution() throws IOException {
        IssuedPlanView plan = plan();
        assertThat(plan.gateStep()).isNotNull();
        byte[] pdf = renderer().pdf(plan, clinic(), LocalDate.of(2027, 3, 1), Locale.ENGLISH);
        assertThat(new String(pdf, 0, 5, StandardCharsets.US_ASCII)).isEqualTo("%PDF-");
        try (PDDocument document = Loader.loadPDF(pdf)) {
            assertThat(document.getNumberOfPages()).isGreaterThanOrEqualTo(1);
            assertThat(document.getDocumentInformation().getTitle()).contains("Zoë Example (T-001)");
            String text = new PDFTextStripper().getText(document).replaceAll("\\s+", " ");
            assertThat(text).contains("For Zoë Example (T-001)").contains("Example Partner Clinic")
                    .contains("+00 000 000 123").contains("desk@example.invalid")
                    .contains("Decision support only: these are mechanical estimates")
                    .contains("Stop and refer on red flags")
                    .contains("Pain during the session up to 5/10")
                    .contains("Before step " + plan.gateStep() + " the patient must be re-screened")
                    .contains("Each step lasts 3 sessions");
            for (PlanStepView s : plan.steps()) {
                assertThat(text).contains(String.format(Locale.ROOT, "%.2f", s.demandRatio()));
            }
            plan.steps().forEach(s -> assertThat(text).contains(s.clubName()));
        }
    }

    @Test
    void theDemandChartIsAPngOfThePrintSize() throws IOException {
        IssuedPlanView plan = plan();
        byte[] png = DemandChartImage.png(plan.steps(), plan.gateStep(),
                new DemandChartImage.Labels("D", "Step", "Band limit", "Re-screen"));
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(png));
        assertThat(image.getWidth()).isEqualTo(1600);
        assertThat(image.getHeight()).isEqualTo(640);
        // The axis always reaches past the band limit D = 1, and 10 % above the highest step.
        double highest = plan.steps().stream().mapToDouble(PlanStepView::demandRatio).max().orElseThrow();
        assertThat(DemandChartImage.yMax(plan.steps())).isGreaterThanOrEqualTo(Math.max(1.2, highest * 1.1));
    }
}
