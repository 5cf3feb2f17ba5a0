package org.swingclearance;

import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.hamcrest.Matchers;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;

/** The application starts on PostgreSQL with every migration applied and serves its public pages. */
@IntegrationTest
class ApplicationSmokeTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;

    @Test
    void healthIsUp() throws Exception {
        mvc.perform(get("/actuator/health")).andExpect(status().isOk()).andExpect(jsonPath("$.status").value("UP"));
    }

    @Test
    void signInPageIsServedWithStrictHeaders() throws Exception {
        mvc.perform(get("/login"))
                .andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString("name=\"_csrf\"")))
                .andExpect(header().string("Content-Security-Policy", Matchers.containsString("script-src 'self';")))
                .andExpect(header().string("Content-Security-Policy", Matchers.not(Matchers.containsString("unsafe-inline"))))
                .andExpect(header().string("Content-Security-Policy", Matchers.containsString("frame-ancestors 'none'")))
                .andExpect(header().string("X-Content-Type-Options", "nosniff"))
                .andExpect(header().string("X-Frame-Options", "DENY"))
                .andExpect(header().string("Referrer-Policy", "same-origin"))
                .andExpect(header().exists("X-Request-Id"));
    }

    @Test
    void pagesNeedSignIn() throws Exception {
        mvc.perform(get("/patients")).andExpect(status().is3xxRedirection())
                .andExpect(redirectedUrl("/login"));
    }

    @Test
    void apiAnswers401WithoutCredentials() throws Exception {
        mvc.perform(get("/api/v1/anything")).andExpect(status().isUnauthorized());
    }

    @Test
    void webjarsAndStylesheetAreServed() throws Exception {
        mvc.perform(get("/css/app.css")).andExpect(status().isOk());
        mvc.perform(get("/webjars/chart.js/dist/chart.umd.js")).andExpect(status().isOk());
        mvc.perform(get("/webjars/htmx.org/dist/htmx.min.js")).andExpect(status().isOk());
    }
}
