package org.swingclearance.identity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestBuilders.formLogin;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.mock.web.MockHttpServletRequest;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.test.web.servlet.MockMvc;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/** Sign-in, throttling per account and per address, password hashing, CSRF and the API's HTTP Basic. */
@IntegrationTest
class SignInTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    PasswordEncoder encoder;
    @Autowired
    ThrottleSettings throttle;

    @Test
    void theRightPasswordSignsInAndIsAudited() throws Exception {
        TestClinic clinic = data.clinic();
        mvc.perform(formLogin("/login").user(clinic.email(StaffRole.CLINICIAN)).password(TestData.PASSWORD))
                .andExpect(redirectedUrl("/"));
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and action = 'SIGN_IN'"
                + " and outcome = 'SUCCESS'", Integer.class, clinic.id())).isEqualTo(1);
    }

    @Test
    void afterTooManyFailuresEvenTheRightPasswordIsRefusedForAWhile() throws Exception {
        TestClinic clinic = data.clinic();
        String email = clinic.email(StaffRole.CLINICIAN);
        for (int i = 0; i < throttle.accountFailures(); i++) {
            mvc.perform(formLogin("/login").user(email).password("wrong password number " + i))
                    .andExpect(redirectedUrl("/login?error"));
        }
        mvc.perform(formLogin("/login").user(email).password(TestData.PASSWORD)).andExpect(redirectedUrl("/login?error"));
        assertThat(jdbc.queryForObject("select count(*) from audit_event where clinic_id = ? and action = 'SIGN_IN'"
                + " and outcome = 'FAILED'", Integer.class, clinic.id())).isEqualTo(throttle.accountFailures() + 1);
    }

    @Test
    void oneAddressTryingManyAccountsIsThrottledToo() throws Exception {
        TestClinic clinic = data.clinic();
        String address = "203.0.113.77";
        for (int i = 0; i < throttle.addressFailures(); i++) {
            String name = "nobody-" + i + "@test.local";
            mvc.perform(login(name, "wrong").with(remote(address)));
        }
        mvc.perform(login(clinic.email(StaffRole.TRAINER), TestData.PASSWORD).with(remote(address)))
                .andExpect(redirectedUrl("/login?error"));
        mvc.perform(login(clinic.email(StaffRole.TRAINER), TestData.PASSWORD).with(remote("203.0.113.78")))
                .andExpect(redirectedUrl("/"));
    }

    private static org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder login(String user,
                                                                                                    String password) {
        return post("/login").with(csrf()).param("username", user).param("password", password);
    }

    private static org.springframework.test.web.servlet.request.RequestPostProcessor remote(String address) {
        return (MockHttpServletRequest request) -> {
            request.setRemoteAddr(address);
            return request;
        };
    }

    @Test
    void passwordsAreHashedWithArgon2AndLongUnicodePasswordsWork() {
        String longUnicode = "ü".repeat(100);
        String hash = encoder.encode(longUnicode);
        assertThat(hash).startsWith("{argon2}");
        assertThat(encoder.matches(longUnicode, hash)).isTrue();
        assertThat(encoder.matches("ü".repeat(99), hash)).isFalse();
    }

    @Test
    void formsWithoutTheCsrfTokenAreRefused() throws Exception {
        TestClinic clinic = data.clinic();
        mvc.perform(post("/patients").with(data.as(clinic.clinician())).param("code", "X"))
                .andExpect(status().isForbidden());
        mvc.perform(post("/patients").with(data.as(clinic.clinician())).with(csrf().useInvalidToken()).param("code", "X"))
                .andExpect(status().isForbidden());
    }

    @Test
    void theApiAcceptsHttpBasicWithoutCsrf() throws Exception {
        TestClinic clinic = data.clinic();
        mvc.perform(post("/api/v1/unknown").with(httpBasic(clinic.email(StaffRole.CLINICIAN), TestData.PASSWORD)))
                .andExpect(status().isNotFound());
        mvc.perform(post("/api/v1/unknown").with(httpBasic(clinic.email(StaffRole.CLINICIAN), "wrong")))
                .andExpect(status().isUnauthorized());
    }
}
