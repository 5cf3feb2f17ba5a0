package org.swingclearance.rules;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.hamcrest.Matchers;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.security.access.AccessDeniedException;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.swingclearance.engine.rules.DefaultRules;
import org.swingclearance.engine.rules.LoadBand;
import org.swingclearance.engine.rules.Rule;
import org.swingclearance.engine.scoring.Instrument;
import org.swingclearance.engine.scoring.Mcid;
import org.swingclearance.support.IntegrationTest;
import org.swingclearance.support.PostgresTestBase;
import org.swingclearance.support.TestData;
import org.swingclearance.support.TestData.TestClinic;
import org.swingclearance.web.ConflictException;

/**
 * Practice rules on real PostgreSQL: a clinic's first use seeds the defaults as version 1; every edit is a new
 * version and the old one stays byte-identical; stale edits conflict; only managers and admins edit; the editor
 * page saves a version and refuses bad entries with field messages.
 */
@IntegrationTest
class PracticeRulesTests extends PostgresTestBase {

    @Autowired
    PracticeRules rules;
    @Autowired
    TestData data;
    @Autowired
    JdbcTemplate jdbc;
    @Autowired
    MockMvc mvc;

    TestClinic clinic;

    @BeforeEach
    void setUp() {
        clinic = data.clinic();
    }

    @Test
    void aClinicStartsWithTheDefaultRulesAsVersionOne() {
        CurrentRuleSet v1 = rules.current(clinic.id());
        assertThat(v1.version()).isEqualTo(1);
        assertThat(v1.createdBy()).isNull();
        assertThat(v1.rules()).isEqualTo(DefaultRules.ruleSet().rules());
        assertThat(v1.defaultBand()).isEqualTo(DefaultRules.DEFAULT_BAND);
        // engine.md §5 defaults: Hold 0, Band 1 0.20, Band 2 0.40, Band 3 0.60, Open 0.80
        assertThat(v1.fraction(LoadBand.BAND_2)).isEqualTo(0.40);
        assertThat(v1.fraction("OPEN")).isEqualTo(0.80);
        assertThat(v1.gripFollowsBand()).isTrue();
        assertThat(v1.gripFractionFor(LoadBand.BAND_1)).isEqualTo(0.20);
        assertThat(v1.controlledStop()).isTrue();
        assertThat(v1.rangeMarginDeg()).isEqualTo(10.0);
        assertThat(v1.hipDrivenMinimumBand()).isEqualTo("BAND_2");
        assertThat(v1.stepLimit()).isEqualTo(0.10);
        assertThat(v1.painDuringLimit()).isEqualTo(5); // Silbernagel 2007 (clinical.md §6.4)
        assertThat(v1.acwrCaution()).isEqualTo(1.5);
        assertThat(v1.planDefaults()).containsOnlyKeys(LoadBand.BAND_1, LoadBand.BAND_2, LoadBand.BAND_3, LoadBand.OPEN);
        assertThat(v1.scoringPolicy().mcid(Instrument.QUICKDASH)).isEqualTo(Mcid.QUICKDASH_SHOULDER);
        assertThat(rules.current(clinic.id()).id()).isEqualTo(v1.id());
        assertThat(jdbc.queryForObject("select count(*) from practice_rule_set where clinic_id = ?", Integer.class,
                clinic.id())).isEqualTo(1);
    }

    @Test
    void anEditIsANewVersionAndTheOldVersionStaysAsItWas() {
        CurrentRuleSet v1 = rules.current(clinic.id());
        String v1Before = ruleRowsText(v1.id());
        List<Rule> changed = new ArrayList<>(v1.rules());
        Rule gird = changed.get(indexOf(changed, "shoulder.gird-ge-20"));
        changed.set(changed.indexOf(gird), new Rule(gird.code(), gird.key(), gird.comparison(), 25, gird.unit(),
                gird.region(), LoadBand.BAND_1, gird.source(), gird.required(), gird.alsoNeedsWhenFired()));
        RuleSetSettings s = v1.settings();
        RuleSetSettings edited = new RuleSetSettings(s.defaultBand(), s.bandFractions(), s.gripFraction(),
                s.controlledStop(), s.rangeMarginDeg(), s.hipDrivenMinimumBand(), s.stepLimit(), s.painDuringLimit(),
                s.acwrCaution(), s.planDefaults(), s.scoringPolicy(), changed);

        int v2 = rules.edit(clinic.manager(), 1, edited, "GIRD threshold per our shoulder lead");

        assertThat(v2).isEqualTo(2);
        CurrentRuleSet current = rules.current(clinic.id());
        assertThat(current.version()).isEqualTo(2);
        assertThat(current.createdBy()).isEqualTo(clinic.manager().staffId());
        assertThat(current.rules().get(indexOf(current.rules(), "shoulder.gird-ge-20")).threshold()).isEqualTo(25);
        assertThat(rules.byId(clinic.id(), v1.id()).orElseThrow()).isEqualTo(v1);
        assertThat(ruleRowsText(v1.id())).isEqualTo(v1Before);
        assertThat(jdbc.queryForList("select action from audit_event where clinic_id = ? and action = 'RULES_EDIT'",
                String.class, clinic.id())).hasSize(1);

        assertThatThrownBy(() -> rules.edit(clinic.admin(), 1, edited, "a second edit from an old page"))
                .isInstanceOf(ConflictException.class);
        assertThatThrownBy(() -> rules.edit(clinic.clinician(), 2, edited, "not allowed"))
                .isInstanceOf(AccessDeniedException.class);
        assertThat(rules.current(clinic.id()).version()).isEqualTo(2);
        assertThat(rules.history(clinic.manager())).extracting(RuleSetSummary::version).containsExactly(2, 1);
    }

    @Test
    void storedVersionsAreRefusedByTheDatabase() {
        CurrentRuleSet v1 = rules.current(clinic.id());
        assertThatThrownBy(() -> jdbc.update("update practice_rule set threshold = 99 where rule_set_id = ?", v1.id()))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("append-only");
        assertThatThrownBy(() -> jdbc.update("delete from practice_rule_set where id = ?", v1.id()))
                .isInstanceOf(DataAccessException.class).hasMessageContaining("append-only");
    }

    @Test
    void theEditorSavesANewVersionAndRefusesBadEntries() throws Exception {
        CurrentRuleSet v1 = rules.current(clinic.id());
        mvc.perform(get("/rules").with(data.as(clinic.manager())))
                .andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString("Practice rules, version 1")))
                .andExpect(content().string(Matchers.containsString("Wilk")));
        mvc.perform(get("/rules/edit").with(data.as(clinic.admin())))
                .andExpect(status().isOk())
                .andExpect(content().string(Matchers.containsString("name=\"rules[0].threshold\"")))
                .andExpect(content().string(Matchers.containsString("name=\"changeNote\"")));
        mvc.perform(get("/rules/edit").with(data.as(clinic.clinician()))).andExpect(status().isForbidden());
        mvc.perform(get("/rules").with(data.as(clinic.trainer()))).andExpect(status().isForbidden());

        Map<String, String> bad = editorForm(v1);
        bad.put("rules[0].threshold", "");
        bad.put("bands[2].fractionPercent", "10");
        bad.put("changeNote", "try");
        mvc.perform(submit(bad)).andExpect(status().isOk())
                .andExpect(model().attributeHasFieldErrorCode("form", "rules[0].threshold", "NotNull"))
                .andExpect(model().attributeHasFieldErrorCode("form", "bands[2].fractionPercent", "rules.error.fractionsOrder"));
        assertThat(rules.current(clinic.id()).version()).isEqualTo(1);

        int last = v1.rules().size();
        Map<String, String> good = editorForm(v1);
        good.put("changeNote", "Add a rule on pain at rest");
        String k = "rules[" + last + "].";
        good.put(k + "code", "lumbopelvic.pain-rest-gt-3");
        good.put(k + "measurement", "PAIN_AT_REST");
        good.put(k + "comparison", "GT");
        good.put(k + "threshold", "3");
        good.put(k + "region", "LUMBOPELVIC");
        good.put(k + "cappedBand", "BAND_2");
        good.put(k + "source", "Clinic lead decision");
        good.put(k + "evidenceTag", "COMMON_PRACTICE");
        good.put("rules[1].remove", "true");
        mvc.perform(submit(good)).andExpect(status().is3xxRedirection());
        CurrentRuleSet v2 = rules.current(clinic.id());
        assertThat(v2.version()).isEqualTo(2);
        assertThat(v2.changeNote()).isEqualTo("Add a rule on pain at rest");
        assertThat(v2.rules()).hasSize(v1.rules().size());
        assertThat(v2.rules()).extracting(Rule::code).doesNotContain(v1.rules().get(1).code())
                .contains("lumbopelvic.pain-rest-gt-3");
        assertThat(v2.rules().get(v2.rules().size() - 1).source().section()).isEqualTo("clinic practice rules");
    }

    /** The editor form as the page would send it for an unchanged version, by parameter name. */
    private Map<String, String> editorForm(CurrentRuleSet r) {
        Map<String, String> p = new LinkedHashMap<>();
        p.put("basedOnVersion", String.valueOf(r.version()));
        p.put("defaultBand", r.defaultBand().name());
        p.put("controlledStop", "true");
        p.put("rangeMarginDeg", "10");
        p.put("hipDrivenMinimumBand", "BAND_2");
        p.put("stepLimitPercent", "10");
        p.put("painDuringLimit", "5");
        p.put("acwrCaution", "1.5");
        p.put("odiMaxMissingSections", "1");
        p.put("spadiMaxMissingItems", "2");
        p.put("spadiTotalMethod", "SUM_OF_ITEMS");
        LoadBand[] bands = LoadBand.values();
        for (int i = 0; i < bands.length; i++) {
            p.put("bands[" + i + "].band", bands[i].name());
            p.put("bands[" + i + "].fractionPercent", String.valueOf(r.fraction(bands[i]) * 100));
            if (bands[i] != LoadBand.HOLD) {
                p.put("bands[" + i + "].sets", String.valueOf(r.planDefaults(bands[i]).sets()));
                p.put("bands[" + i + "].reps", String.valueOf(r.planDefaults(bands[i]).reps()));
                p.put("bands[" + i + "].effortCap", String.valueOf(r.planDefaults(bands[i]).effortCap()));
            }
        }
        Instrument[] instruments = Instrument.values();
        for (int i = 0; i < instruments.length; i++) {
            Mcid m = r.scoringPolicy().mcid(instruments[i]);
            String k = "mcids[" + i + "].";
            p.put(k + "instrument", instruments[i].name());
            p.put(k + "points", String.valueOf(m.points()));
            p.put(k + "source", m.citation().work());
            p.put(k + "sourceSection", m.citation().section());
            p.put(k + "evidenceTag", m.citation().tag().name());
            p.put(k + "confidence", m.citation().confidence().name());
            if (m.percent().isPresent()) {
                p.put(k + "percent", String.valueOf(m.percent().getAsDouble()));
            }
        }
        for (int i = 0; i < r.rules().size(); i++) {
            Rule rule = r.rules().get(i);
            String k = "rules[" + i + "].";
            p.put(k + "code", rule.code());
            p.put(k + "measurement", rule.key().name());
            p.put(k + "comparison", rule.comparison().name());
            p.put(k + "threshold", String.valueOf(rule.threshold()));
            p.put(k + "region", rule.region().name());
            p.put(k + "cappedBand", rule.caps().name());
            p.put(k + "source", rule.source().work());
            p.put(k + "sourceSection", rule.source().section());
            p.put(k + "evidenceTag", rule.source().tag().name());
            p.put(k + "confidence", rule.source().confidence().name());
            p.put(k + "required", String.valueOf(rule.required()));
            p.put(k + "alsoNeeds", String.join(",", rule.alsoNeedsWhenFired().stream().map(Enum::name).toList()));
        }
        return p;
    }

    private MockHttpServletRequestBuilder submit(Map<String, String> params) {
        MockHttpServletRequestBuilder request = post("/rules").with(csrf()).with(data.as(clinic.manager()));
        params.forEach(request::param);
        return request;
    }

    private static int indexOf(List<Rule> rules, String code) {
        for (int i = 0; i < rules.size(); i++) {
            if (rules.get(i).code().equals(code)) {
                return i;
            }
        }
        throw new IllegalArgumentException(code);
    }

    private String ruleRowsText(UUID ruleSetId) {
        return String.join("\n", jdbc.queryForList("select r::text from practice_rule r where rule_set_id = ? order by position",
                String.class, ruleSetId)) + jdbc.queryForObject("select s::text from practice_rule_set s where id = ?",
                String.class, ruleSetId);
    }
}
