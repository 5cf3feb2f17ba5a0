package org.swingclearance.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.fail;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;

import java.lang.reflect.Method;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.UUID;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.TestInstance;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.beans.factory.annotation.Qualifier;
import org.springframework.core.annotation.AnnotatedElementUtils;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.security.access.prepost.PreAuthorize;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.web.bind.annotation.RequestMethod;
import org.springframework.web.method.HandlerMethod;
import org.springframework.web.servlet.mvc.method.RequestMappingInfo;
import org.springframework.web.servlet.mvc.method.annotation.RequestMappingHandlerMapping;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.patient.Patients;
import org.swingclearance.plan.PlanScenario;
import org.swingclearance.plan.Plans;
import org.swingclearance.screening.Screenings;
import org.swingclearance.training.SessionEntry;
import org.swingclearance.training.SessionLogs;
import org.swingclearance.training.TrainingPlan;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/**
 * Every page that reads patient data writes an audit event (ISO 27789 "read"; security-audit-interop.md B.1).
 * The sweep finds the pages itself in Spring's handler mapping: every GET whose path carries a patient-data path
 * variable or lies under a patient-data prefix. Each is called with real records of one clinic, as the role its
 * {@code @PreAuthorize} names, and must answer without error and add an audit row; a page about one patient's
 * record must add a row that names that patient. A new page without auditing fails this test, and so does a new
 * path variable nobody gave a fixture: add it to {@link #fixtures} (or, with a reason, to {@link #EXEMPT}).
 */
@IntegrationTest
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PatientDataAuditSweepTests extends PostgresTestBase {

    /** Paths under these prefixes show patient data whatever their variables. */
    static final List<String> PATIENT_PREFIXES = List.of("/patients", "/episodes", "/screenings", "/plans",
            "/sessions", "/envelope");

    /** Path variables that name a patient's record (or a record of exactly one patient). */
    static final Set<String> PATIENT_VARIABLES = Set.of("patientId", "episodeId", "screeningId", "versionId",
            "planId", "sessionId", "envelopeId", "consentId", "shareId");

    /** GET pages that show no patient's data, each with the reason it needs no audit row. */
    static final Map<String, String> EXEMPT = Map.of(
            "/patients/new", "the empty intake form: it shows no patient and reads nothing");

    private static final Pattern ROLE = Pattern.compile("has(?:Any)?Role\\('([A-Z_]+)'");
    private static final Pattern VARIABLE = Pattern.compile("\\{([^}:]+)(?::[^}]*)?}");

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    @Qualifier("requestMappingHandlerMapping")
    RequestMappingHandlerMapping mapping;

    @Autowired
    Screenings screenings;
    @Autowired
    Clubs clubs;
    @Autowired
    Plans plans;
    @Autowired
    Patients patients;
    @Autowired
    SessionLogs sessionLogs;

    TestClinic clinic;
    UUID patient;
    UUID episode;
    UUID screening;
    UUID plan;
    UUID sessionLog;

    /**
     * A real record for each path variable, keyed by "variable" or, for a bare {id}, by "prefix:id". Features
     * that add pages add their records here (a plan, a shared plan for a trainer, a session...).
     */
    Map<String, Function<TestClinic, Object>> fixtures;

    /**
     * One patient's episode carrying every record a page can show, so that every page has something to read: clubs
     * and a signed screening (the envelope), an issued plan shared with the clinic's trainer (the trainer's plan
     * pages and the training log), a logged session, and a screening in draft.
     */
    @BeforeAll
    void records() {
        PlanScenario scenario = PlanScenario.create(data, clubs, screenings);
        clinic = scenario.clinic();
        patient = scenario.patientId();
        episode = scenario.episodeId();
        plan = scenario.issuedAndSharedPlan(plans, patients);
        CurrentStaff trainer = clinic.trainer();
        LocalDate today = sessionLogs.today();
        TrainingPlan training = sessionLogs.planForLogging(trainer, episode);
        sessionLog = sessionLogs.log(trainer, episode,
                new SessionEntry(today, training.currentStepOn(today).number(), true, null, 30, 4, 1, 2, null));
        screening = screenings.start(clinic.clinician(), episode);
        fixtures = Map.of(
                "/patients:id", c -> patient,
                "patientId", c -> patient,
                "/episodes:id", c -> episode,
                "episodeId", c -> episode,
                "/screenings:id", c -> screening,
                "screeningId", c -> screening,
                "versionNo", c -> 1,
                "planId", c -> plan,
                "logId", c -> sessionLog);
    }

    @TestFactory
    Stream<DynamicTest> everyPageShowingPatientDataWritesAnAuditEvent() {
        return patientDataPages().entrySet().stream().map(page -> DynamicTest.dynamicTest("GET " + page.getKey(),
                () -> callAndExpectAudit(page.getKey(), page.getValue())));
    }

    /** The sweep must see the pages it is meant to guard; if it finds none, it proves nothing. */
    @Test
    void theSweepFindsThePatientPages() {
        assertThat(patientDataPages().keySet()).contains("/patients/{id}", "/patients/{id}/edit",
                "/screenings/{id}", "/audit/patients/{patientId}");
    }

    private void callAndExpectAudit(String path, HandlerMethod handler) throws Exception {
        StaffRole role = roleFor(handler);
        CurrentStaff staff = clinic.staff().get(role);
        List<Object> values = new ArrayList<>();
        boolean namesOnePatient = false;
        Matcher variables = VARIABLE.matcher(path);
        while (variables.find()) {
            String name = variables.group(1);
            Function<TestClinic, Object> fixture = fixtures.get(name);
            if (fixture == null) {
                fixture = fixtures.get(prefixOf(path) + ":" + name);
            }
            if (fixture == null) {
                fail("no record for path variable {" + name + "} of GET " + path
                        + ": add one to PatientDataAuditSweepTests.fixtures");
            }
            values.add(fixture.apply(clinic));
            namesOnePatient = true;
        }
        long before = auditRows();
        long aboutPatientBefore = auditRowsAbout(patient);

        MvcResult result = mvc.perform(get(path, values.toArray()).with(data.as(staff))).andReturn();

        assertThat(result.getResponse().getStatus()).as("GET %s as %s answers without error", path, role)
                .isLessThan(400);
        assertThat(auditRows()).as("GET %s (%s) writes an audit event", path, handler.getShortLogMessage())
                .isGreaterThan(before);
        if (namesOnePatient) {
            assertThat(auditRowsAbout(patient)).as("GET %s records which patient was read", path)
                    .isGreaterThan(aboutPatientBefore);
        }
    }

    /** GET handlers in scope, by path pattern, minus the exemptions. */
    private Map<String, HandlerMethod> patientDataPages() {
        Map<String, HandlerMethod> pages = new TreeMap<>();
        for (Map.Entry<RequestMappingInfo, HandlerMethod> entry : mapping.getHandlerMethods().entrySet()) {
            RequestMappingInfo info = entry.getKey();
            Set<RequestMethod> methods = info.getMethodsCondition().getMethods();
            if (!methods.isEmpty() && !methods.contains(RequestMethod.GET)) {
                continue;
            }
            for (String path : info.getPatternValues()) {
                if (inScope(path) && !EXEMPT.containsKey(path)) {
                    pages.put(path, entry.getValue());
                }
            }
        }
        return pages;
    }

    private static boolean inScope(String path) {
        Matcher variables = VARIABLE.matcher(path);
        while (variables.find()) {
            if (PATIENT_VARIABLES.contains(variables.group(1))) {
                return true;
            }
        }
        return PATIENT_PREFIXES.stream().anyMatch(prefix -> path.equals(prefix) || path.startsWith(prefix + "/"));
    }

    private static String prefixOf(String path) {
        int second = path.indexOf('/', 1);
        return second < 0 ? path : path.substring(0, second);
    }

    /** The first role the handler's (or its controller's) @PreAuthorize names; clinicians if none is named. */
    private static StaffRole roleFor(HandlerMethod handler) {
        Method method = handler.getMethod();
        PreAuthorize rule = AnnotatedElementUtils.findMergedAnnotation(method, PreAuthorize.class);
        if (rule == null) {
            rule = AnnotatedElementUtils.findMergedAnnotation(handler.getBeanType(), PreAuthorize.class);
        }
        if (rule != null) {
            Matcher role = ROLE.matcher(rule.value());
            if (role.find()) {
                return StaffRole.valueOf(role.group(1));
            }
        }
        return StaffRole.CLINICIAN;
    }

    private long auditRows() {
        return jdbc.queryForObject("select count(*) from audit_event where clinic_id = ?", Long.class, clinic.id());
    }

    private long auditRowsAbout(UUID patientId) {
        return jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and patient_id = ?",
                Long.class, clinic.id(), patientId);
    }
}
