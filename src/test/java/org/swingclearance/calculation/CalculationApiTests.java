package org.swingclearance.calculation;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.nullValue;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;
import org.springframework.test.web.servlet.ResultMatcher;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;
import tools.jackson.databind.json.JsonMapper;

/**
 * The calculations API over HTTP Basic on the real application: the CASE-M80 check case (biomechanics.md §0.2,
 * g = 9.81), the envelope, and a 400 problem document naming the field for every kind of bad input.
 */
@IntegrationTest
class CalculationApiTests extends PostgresTestBase {

    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;

    TestClinic clinic;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
    }

    /** CASE-M80 as the example request, with g = 9.81 for the published check values. */
    private static Map<String, Object> m80() {
        Map<String, Object> body = new LinkedHashMap<>();
        body.put("statureM", 1.78);
        body.put("massKg", 80);
        body.put("shoulderToGripM", null);
        Map<String, Object> club = new LinkedHashMap<>();
        club.put("massKg", 6);
        club.put("lengthM", 0.6);
        club.put("balancePointM", 0.45);
        club.put("handleLengthM", 0.3);
        club.put("headCentreM", 0.5);
        club.put("inertiaAboutBalancePointKgM2", null);
        club.put("pendulum", null);
        Map<String, Object> pattern = new LinkedHashMap<>();
        pattern.put("centreDeg", 0);
        pattern.put("halfArcDeg", 60);
        pattern.put("hands", 1);
        pattern.put("reach", 1.0);
        pattern.put("kind", "RHYTHMIC");
        Map<String, Object> request = new LinkedHashMap<>();
        request.put("body", body);
        request.put("club", club);
        request.put("gripMarkM", 0.05);
        request.put("pattern", pattern);
        request.put("cycleTimeS", 2.0);
        request.put("gravity", 9.81);
        return request;
    }

    /** The envelope request: CASE-M80 plus the example capacity and rules. */
    private static Map<String, Object> m80Envelope() {
        Map<String, Object> request = m80();
        request.put("capacity", new LinkedHashMap<>(Map.of("shoulderFlexionTorqueNm", 60, "gripStrengthKg", 45)));
        request.put("bandFraction", 0.4);
        request.put("gripFraction", null);
        request.put("controlledStop", true);
        request.put("shoulderFlexionRangeDeg", null);
        request.put("rangeMarginDeg", 10);
        return request;
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> part(Map<String, Object> request, String name) {
        return (Map<String, Object>) request.get(name);
    }

    /** As the clinic's clinician, already signed in (HTTP Basic itself is exercised in {@link Demand}). */
    private ResultActions call(String endpoint, Object request) throws Exception {
        return call(endpoint, JSON.writeValueAsString(request));
    }

    private ResultActions call(String endpoint, String json) throws Exception {
        return mvc.perform(post("/api/v1/calculations/" + endpoint).contentType(MediaType.APPLICATION_JSON)
                .content(json).with(data.as(clinic.clinician())));
    }

    /** Through the API's HTTP Basic sign-in with the role's real password. */
    private ResultActions callWithBasic(StaffRole role, String endpoint, String json) throws Exception {
        return mvc.perform(post("/api/v1/calculations/" + endpoint).contentType(MediaType.APPLICATION_JSON)
                .content(json).with(httpBasic(clinic.email(role), TestData.PASSWORD)));
    }

    /** A number at a JSON path within a tolerance, whatever numeric type the JSON parser chose for it. */
    private static ResultMatcher near(String path, double value, double tolerance) {
        return jsonPath(path, closeTo(value, tolerance), Double.class);
    }

    private static void assertBadField(ResultActions result, String field) throws Exception {
        result.andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.status").value(400))
                .andExpect(jsonPath("$.errors[*].field", hasItem(field)));
    }

    @Nested
    class Demand {

        @Test
        void checkCaseM80ThroughHttp() throws Exception {
            call("demand", m80()).andExpect(status().isOk())
                    .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_JSON))
                    .andExpect(near("$.shoulderToGripM", 0.68708, 5e-6)) // S8
                    .andExpect(near("$.momentArmM", 1.08708, 5e-6)) // S10
                    .andExpect(near("$.clubInertiaAboutBalancePointKgM2", 0.09, 5e-8)) // S12
                    .andExpect(jsonPath("$.clubInertiaSource").value("MODELLED"))
                    .andExpect(near("$.systemInertiaKgM2", 7.7616174, 5e-8)) // S17
                    .andExpect(near("$.naturalPeriodS", 2.004299, 5e-7)) // S22
                    .andExpect(near("$.peakAngularVelocityRadS", 3.289868, 5e-7)) // S24
                    .andExpect(near("$.peakShoulderTorqueNm", 14.1628, 5e-5)) // S27
                    .andExpect(near("$.holdTorqueNm", 66.0568, 5e-5)) // §2.7: g·Σmr·sin 60°
                    .andExpect(near("$.peakGripPullN", 129.454, 5e-4)) // S30
                    .andExpect(near("$.peakWristMomentNm", 7.5055, 5e-5)) // §2.4
                    .andExpect(near("$.positiveWorkPerCycleJ", 7.730, 5e-4)) // S33
                    .andExpect(jsonPath("$.assumptions", not(empty())))
                    .andExpect(jsonPath("$.engineVersion").isString());
        }

        @Test
        void pendulumTimingMakesTheInertiaMeasured() throws Exception {
            Map<String, Object> request = m80();
            part(request, "club").put("pendulum", Map.of("pivotFromBalancePointM", 0.45, "swings", 20,
                    "seconds", 28.0));
            call("demand", request).andExpect(status().isOk())
                    .andExpect(jsonPath("$.clubInertiaSource").value("MEASURED"))
                    .andExpect(near("$.clubInertiaAboutBalancePointKgM2", 0.100010, 5e-7)); // S41
        }

        @Test
        void anyStaffRoleMayCalculateWithHttpBasic() throws Exception {
            for (StaffRole role : StaffRole.values()) {
                callWithBasic(role, "demand", JSON.writeValueAsString(m80())).andExpect(status().isOk());
            }
        }

        @Test
        void unauthenticatedOrWrongPasswordIs401() throws Exception {
            mvc.perform(post("/api/v1/calculations/demand").contentType(MediaType.APPLICATION_JSON)
                    .content(JSON.writeValueAsString(m80()))).andExpect(status().isUnauthorized());
            mvc.perform(post("/api/v1/calculations/demand").contentType(MediaType.APPLICATION_JSON)
                    .content(JSON.writeValueAsString(m80()))
                    .with(httpBasic(clinic.email(StaffRole.CLINICIAN), "not the password")))
                    .andExpect(status().isUnauthorized());
        }
    }

    @Nested
    class Envelope {

        @Test
        void exampleRequestIsHeldBackByTheHoldTorque() throws Exception {
            // Holding still at ±60° needs 66 N·m against 0.4 × 60 N·m: nothing at this grip is permitted at any
            // tempo (C2 does not depend on the cycle time).
            call("envelope", m80Envelope()).andExpect(status().isOk())
                    .andExpect(jsonPath("$.atConfiguration.permitted").value(false))
                    .andExpect(jsonPath("$.atConfiguration.binding").value("HOLD_TORQUE"))
                    .andExpect(near("$.atConfiguration.demandRatio", 66.0568 / 24.0, 5e-5))
                    .andExpect(near("$.atConfiguration.peakShoulderTorqueNm", 14.1628, 5e-5))
                    .andExpect(jsonPath("$.minCycleTime.status").value("NOT_PERMISSIBLE"))
                    .andExpect(jsonPath("$.minCycleTime.cycleTimeS", nullValue()))
                    .andExpect(jsonPath("$.maxMomentArm.status").value("NOT_PERMISSIBLE"))
                    .andExpect(jsonPath("$.maxClubMass.status").value("OK"))
                    .andExpect(jsonPath("$.maxHalfArcDeg", nullValue()));
        }

        @Test
        void tempoWindowEdgeOfS48ThroughHttp() throws Exception {
            Map<String, Object> request = m80Envelope();
            request.put("capacity", Map.of("shoulderFlexionTorqueNm", 80)); // f·τ_cap = 0.5 × 80 = 40 N·m
            request.put("bandFraction", 0.5);
            request.put("controlledStop", false);
            call("envelope", request).andExpect(status().isOk())
                    .andExpect(jsonPath("$.atConfiguration.permitted").value(true))
                    .andExpect(jsonPath("$.atConfiguration.binding").value("SHOULDER_TORQUE"))
                    .andExpect(jsonPath("$.minCycleTime.status").value("OK"))
                    .andExpect(near("$.minCycleTime.cycleTimeS", 1.7394, 5e-5)) // S48
                    .andExpect(jsonPath("$.maxMomentArm.status").value("OK"))
                    .andExpect(jsonPath("$.maxMomentArm.gripMarkM").value(0.0))
                    .andExpect(jsonPath("$.maxClubMass.massKg").isNumber());
        }

        @Test
        void rangeOfMotionExcludesThePatternAndReportsTheLargestHalfArc() throws Exception {
            Map<String, Object> request = m80Envelope();
            request.put("shoulderFlexionRangeDeg", 60);
            call("envelope", request).andExpect(status().isOk())
                    .andExpect(jsonPath("$.atConfiguration.binding").value("RANGE_OF_MOTION"))
                    .andExpect(near("$.maxHalfArcDeg", 50.0, 1e-9))
                    .andExpect(jsonPath("$.maxClubMass.status").value("NOT_PERMISSIBLE"));
        }

        @Test
        void missingCapacityOrAnAbsurdBandFractionIsNamed() throws Exception {
            Map<String, Object> request = m80Envelope();
            request.remove("capacity");
            assertBadField(call("envelope", request), "capacity");
            Map<String, Object> fraction = m80Envelope();
            fraction.put("bandFraction", 1.5);
            assertBadField(call("envelope", fraction), "bandFraction");
        }
    }

    @Nested
    class BadInput {

        @Test
        void malformedJsonIs400() throws Exception {
            call("demand", "{\"body\": {\"statureM\": 1.78,")
                    .andExpect(status().isBadRequest())
                    .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                    .andExpect(jsonPath("$.title").isString());
        }

        @Test
        void wrongTypesNameTheirField() throws Exception {
            Map<String, Object> kind = m80();
            part(kind, "pattern").put("kind", "SIDEWAYS");
            assertBadField(call("demand", kind), "pattern.kind");
            Map<String, Object> text = m80();
            part(text, "body").put("massKg", "heavy");
            assertBadField(call("demand", text), "body.massKg");
        }

        @Test
        void missingFieldsAreEachNamed() throws Exception {
            Map<String, Object> request = m80();
            part(request, "body").remove("statureM");
            request.remove("cycleTimeS");
            request.remove("pattern");
            ResultActions result = call("demand", request);
            assertBadField(result, "body.statureM");
            assertBadField(result, "cycleTimeS");
            assertBadField(result, "pattern");
        }

        @ParameterizedTest
        @CsvSource({
            "body, massKg, 0, body.massKg",
            "body, massKg, 10000, body.massKg",
            "club, massKg, 0, club.massKg",
            "club, massKg, 10000, club.massKg",
            "club, balancePointM, 0.7, club.balancePointM",
            "club, handleLengthM, 0.65, club.handleLengthM",
            "pattern, halfArcDeg, 190, pattern.halfArcDeg",
            "pattern, hands, 1.5, pattern.hands",
            "pattern, hands, 3, pattern.hands",
            "pattern, reach, 0, pattern.reach"
        })
        void absurdNestedValuesNameTheirField(String part, String field, double value, String path) throws Exception {
            Map<String, Object> request = m80();
            part(request, part).put(field, value);
            assertBadField(call("demand", request), path);
        }

        @Test
        void gripBeyondTheHandleIsNamed() throws Exception {
            Map<String, Object> request = m80();
            request.put("gripMarkM", 0.35);
            assertBadField(call("demand", request), "gripMarkM");
        }

        @Test
        void zeroCycleTimeIsNamed() throws Exception {
            Map<String, Object> request = m80();
            request.put("cycleTimeS", 0);
            assertBadField(call("demand", request), "cycleTimeS");
        }

        @Test
        void arcPastStraightUpIsNamed() throws Exception {
            Map<String, Object> request = m80();
            part(request, "pattern").put("centreDeg", 150);
            assertBadField(call("demand", request), "pattern.halfArcDeg");
        }

        @Test
        void pendulumTimingThatGivesNoPositiveInertiaIsNamed() throws Exception {
            Map<String, Object> request = m80();
            part(request, "club").put("pendulum", Map.of("pivotFromBalancePointM", 0.45, "swings", 20,
                    "seconds", 20.0));
            assertBadField(call("demand", request), "club.pendulum");
        }
    }
}
