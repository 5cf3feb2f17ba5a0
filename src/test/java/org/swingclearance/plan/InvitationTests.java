package org.swingclearance.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.time.LocalDate;
import java.util.Map;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.test.web.servlet.MockMvc;
import org.swingclearance.equipment.Clubs;
import org.swingclearance.identity.CurrentStaff;
import org.swingclearance.identity.StaffRole;
import org.swingclearance.identity.UnitSystem;
import org.swingclearance.patient.Patients;
import org.swingclearance.screening.Screenings;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.web.InvalidStateException;

/**
 * Inviting a trainer without an account: only on a consent naming them; the link works once and expires; only the
 * SHA-256 of its token is stored; using it opens a TRAINER account in the clinic with the plan shared.
 */
@IntegrationTest
class InvitationTests extends PostgresTestBase {

    static final String GOOD_PASSWORD = "violet harbour lantern seventeen";

    @Autowired
    MockMvc mvc;
    @Autowired
    TestData data;
    @Autowired
    Clubs clubs;
    @Autowired
    Screenings screenings;
    @Autowired
    Plans plans;
    @Autowired
    PlanDrafting drafting;
    @Autowired
    Patients patients;
    @Autowired
    JdbcTemplate jdbc;

    record Invited(PlanScenario scenario, UUID planId, String email, NewInvitation invitation) {
    }

    Invited invite() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        plans.issue(s.clinician(), planId, plans.page(s.clinician(), s.episodeId).draft().lockVersion());
        String email = "new-coach-" + UUID.randomUUID().toString().substring(0, 8) + "@test.local";
        patients.recordConsent(s.clinician(), s.patientId, "Kim Newcoach", email, LocalDate.now());
        return new Invited(s, planId, email, plans.invite(s.clinician(), planId, email, "Kim Newcoach"));
    }

    @Test
    void anInvitationNeedsAConsentAndAnEmailWithoutAccount() {
        PlanScenario s = PlanScenario.create(data, clubs, screenings);
        UUID planId = plans.generate(s.clinician(), s.episodeId, s.settings(drafting));
        plans.issue(s.clinician(), planId, plans.page(s.clinician(), s.episodeId).draft().lockVersion());
        assertThatThrownBy(() -> plans.invite(s.clinician(), planId, "nobody@test.local", "No Body"))
                .isInstanceOfSatisfying(InvalidStateException.class,
                        e -> assertThat(e.messageKey()).isEqualTo("plan.invite.error.noConsent"));
        assertThatThrownBy(() -> plans.invite(s.clinician(), planId, s.trainer().email(), "Anyone"))
                .isInstanceOfSatisfying(InvalidStateException.class,
                        e -> assertThat(e.messageKey()).isEqualTo("plan.invite.error.accountExists"));
    }

    @Test
    void theLinkOpensATrainerAccountWithThePlanSharedAndWorksOnce() throws Exception {
        Invited i = invite();
        String token = i.invitation().token();
        // Only the SHA-256 is stored, never the token itself.
        Map<String, Object> row = jdbc.queryForMap("select token_sha256 from trainer_invitation where email = ?", i.email());
        assertThat(row.get("token_sha256")).isEqualTo(InvitationTokens.sha256(token));
        assertThat(jdbc.queryForObject("select count(*) from trainer_invitation where token_sha256 = ?", Integer.class,
                token)).isZero();

        mvc.perform(get("/invitations/{t}", token)).andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString(i.scenario().clinic.name())));
        // A weak password is refused beside the field and the link stays usable.
        mvc.perform(post("/invitations/{t}", token).with(csrf()).param("displayName", "Kim Newcoach")
                        .param("password", "short"))
                .andExpect(status().isOk()).andExpect(model().attributeHasFieldErrorCode("form", "password",
                        "password.error.tooShort"));
        mvc.perform(post("/invitations/{t}", token).with(csrf()).param("displayName", "Kim Newcoach")
                        .param("password", GOOD_PASSWORD))
                .andExpect(status().isOk()).andExpect(model().attribute("done", true));

        Map<String, Object> account = jdbc.queryForMap("select id, clinic_id, role from staff_account where email = ?",
                i.email());
        assertThat(account.get("role")).isEqualTo("TRAINER");
        assertThat(account.get("clinic_id")).isEqualTo(i.scenario().clinic.id());
        CurrentStaff trainer = new CurrentStaff((UUID) account.get("id"), i.scenario().clinic.id(), StaffRole.TRAINER,
                i.email(), "Kim Newcoach", UnitSystem.METRIC);
        assertThat(plans.isSharedWith(trainer, i.planId())).isTrue();
        assertThat(plans.issuedPlan(trainer, i.planId()).planId()).isEqualTo(i.planId());

        // Once only: a second use is refused (410 Gone) and opens no second account.
        mvc.perform(post("/invitations/{t}", token).with(csrf()).param("displayName", "Someone Else")
                .param("password", GOOD_PASSWORD + " again")).andExpect(status().isGone());
        mvc.perform(get("/invitations/{t}", token)).andExpect(status().isGone());
        assertThat(jdbc.queryForObject("select count(*) from staff_account where email = ?", Integer.class, i.email()))
                .isEqualTo(1);
        // A used invitation is history in the database too.
        assertThatThrownBy(() -> jdbc.update("update trainer_invitation set used_at = null, account_id = null"
                + " where email = ?", i.email())).isInstanceOf(DataAccessException.class);
        assertThat(jdbc.queryForObject("select count(*) from audit_event where action = 'INVITATION_ACCEPT'"
                + " and outcome = 'SUCCESS' and actor_id = ?", Integer.class, account.get("id"))).isEqualTo(1);
    }

    @Test
    void anExpiredOrUnknownLinkOpensNothing() throws Exception {
        Invited i = invite();
        // Seven days later (shifted in the database: the application's clock is the real one).
        jdbc.update("update trainer_invitation set created_at = created_at - interval '8 days',"
                + " expires_at = expires_at - interval '8 days' where email = ?", i.email());
        mvc.perform(get("/invitations/{t}", i.invitation().token())).andExpect(status().isGone())
                .andExpect(content().string(Matchers.containsString("expired")));
        mvc.perform(post("/invitations/{t}", i.invitation().token()).with(csrf()).param("displayName", "Kim Newcoach")
                .param("password", GOOD_PASSWORD)).andExpect(status().isGone());
        assertThat(jdbc.queryForObject("select count(*) from staff_account where email = ?", Integer.class, i.email()))
                .isZero();
        mvc.perform(get("/invitations/{t}", "not-a-real-token")).andExpect(status().isNotFound());
    }

    @Test
    void theInvitationExpiresAfterSevenDays() {
        Invited i = invite();
        assertThat(jdbc.queryForObject("select expires_at - created_at = interval '7 days' from trainer_invitation"
                + " where email = ?", Boolean.class, i.email())).isTrue();
    }
}
