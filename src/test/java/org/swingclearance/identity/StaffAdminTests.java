package org.swingclearance.identity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;

/** A clinic administrator manages that clinic's staff, and only that clinic's. */
@IntegrationTest
class StaffAdminTests extends PostgresTestBase {

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;

    @Test
    void anAdministratorCreatesATrainerWithAStrongPassword() throws Exception {
        TestClinic clinic = data.clinic();
        mvc.perform(post("/staff").with(csrf()).with(data.as(clinic.admin()))
                        .param("email", "new.trainer@test.local").param("displayName", "New Trainer")
                        .param("role", "TRAINER").param("password", "short"))
                .andExpect(model().attributeHasFieldErrorCode("form", "password", "password.error.tooShort"));
        assertThat(count("new.trainer@test.local")).isZero();
        mvc.perform(post("/staff").with(csrf()).with(data.as(clinic.admin()))
                        .param("email", "New.Trainer@test.local").param("displayName", "New Trainer")
                        .param("role", "TRAINER").param("password", "seventeen letters"))
                .andExpect(status().is3xxRedirection());
        assertThat(count("new.trainer@test.local")).isEqualTo(1);
        assertThat(jdbc.queryForObject("select password_hash from staff_account where email = ?", String.class,
                "new.trainer@test.local")).startsWith("{argon2}");
    }

    @Test
    void otherRolesCannotManageStaffAndAnotherClinicsAccountIsA404() throws Exception {
        TestClinic clinic = data.clinic();
        TestClinic other = data.clinic();
        for (StaffRole role : new StaffRole[] {StaffRole.CLINICIAN, StaffRole.TRAINER, StaffRole.MANAGER}) {
            mvc.perform(get("/staff").with(data.as(clinic.staff().get(role)))).andExpect(status().isForbidden());
        }
        mvc.perform(get("/staff/{id}", other.clinician().staffId()).with(data.as(clinic.admin())))
                .andExpect(status().isNotFound());
    }

    @Test
    void anAdministratorCannotLockThemselvesOut() throws Exception {
        TestClinic clinic = data.clinic();
        mvc.perform(post("/staff/{id}", clinic.admin().staffId()).with(csrf()).with(data.as(clinic.admin()))
                        .param("email", clinic.admin().email()).param("displayName", "Admin")
                        .param("role", "CLINICIAN").param("enabled", "true").param("version", "0"))
                .andExpect(model().attributeHasErrors("form"));
        assertThat(jdbc.queryForObject("select role from staff_account where id = ?", String.class,
                clinic.admin().staffId())).isEqualTo("ADMIN");
    }

    private int count(String email) {
        return jdbc.queryForObject("select count(*) from staff_account where lower(email) = ?", Integer.class, email);
    }
}
