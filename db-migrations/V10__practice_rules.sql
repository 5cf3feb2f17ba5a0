-- A clinic's practice rules: versioned thresholds that cap load bands, the scoring conventions, and the settings
-- the limits and plans use (Contract R). Every edit inserts a complete new version; no version is ever updated or
-- deleted, so a signed screening can always show the exact rules it was banded with.

CREATE TABLE practice_rule_set (
    id                       uuid PRIMARY KEY,
    clinic_id                uuid             NOT NULL REFERENCES clinic (id),
    version                  integer          NOT NULL CHECK (version >= 1),
    -- null for the defaults the application seeds; otherwise the MANAGER or ADMIN who saved the version
    created_by               uuid             REFERENCES staff_account (id),
    created_at               timestamptz      NOT NULL,
    change_note              varchar(1000),
    -- band of a region when no rule restricts it, and the ceiling of every suggestion
    default_band             varchar(10)      NOT NULL,
    fraction_hold            double precision NOT NULL,
    fraction_band_1          double precision NOT NULL,
    fraction_band_2          double precision NOT NULL,
    fraction_band_3          double precision NOT NULL,
    fraction_open            double precision NOT NULL,
    -- null: the grip constraint uses the band's own fraction
    grip_fraction            double precision CHECK (grip_fraction IS NULL OR (grip_fraction > 0 AND grip_fraction <= 1)),
    controlled_stop          boolean          NOT NULL,
    range_margin_deg         double precision NOT NULL CHECK (range_margin_deg BETWEEN 0 AND 90),
    hip_driven_minimum_band  varchar(10)      NOT NULL,
    step_limit               double precision NOT NULL CHECK (step_limit > 0 AND step_limit <= 1),
    pain_during_limit        integer          NOT NULL CHECK (pain_during_limit BETWEEN 0 AND 10),
    acwr_caution             double precision NOT NULL CHECK (acwr_caution > 0 AND acwr_caution <= 5),
    -- scoring conventions where the published rule is silent (clinical.md §4.2, §4.3)
    odi_max_missing_sections integer          NOT NULL CHECK (odi_max_missing_sections BETWEEN 0 AND 9),
    spadi_max_missing_items  integer          NOT NULL CHECK (spadi_max_missing_items BETWEEN 0 AND 12),
    spadi_total_method       varchar(30)      NOT NULL,
    CONSTRAINT practice_rule_set_version_uq UNIQUE (clinic_id, version),
    CONSTRAINT practice_rule_set_fractions_ordered CHECK (
        fraction_hold >= 0 AND fraction_hold <= fraction_band_1 AND fraction_band_1 <= fraction_band_2
        AND fraction_band_2 <= fraction_band_3 AND fraction_band_3 <= fraction_open AND fraction_open <= 1),
    CONSTRAINT practice_rule_set_bands CHECK (
        default_band IN ('HOLD', 'BAND_1', 'BAND_2', 'BAND_3', 'OPEN')
        AND hip_driven_minimum_band IN ('HOLD', 'BAND_1', 'BAND_2', 'BAND_3', 'OPEN')),
    -- an edit says why; the seeded defaults have no author
    CONSTRAINT practice_rule_set_note CHECK (created_by IS NULL OR length(trim(change_note)) > 0)
);
CREATE INDEX practice_rule_set_clinic_idx ON practice_rule_set (clinic_id, version DESC);

-- Defaults for the steps of a graded plan in each band that permits training (Hold has none).
CREATE TABLE practice_rule_band_plan (
    rule_set_id uuid        NOT NULL REFERENCES practice_rule_set (id),
    band        varchar(10) NOT NULL CHECK (band IN ('BAND_1', 'BAND_2', 'BAND_3', 'OPEN')),
    sets        integer     NOT NULL CHECK (sets BETWEEN 1 AND 20),
    reps        integer     NOT NULL CHECK (reps BETWEEN 1 AND 200),
    effort_cap  integer     NOT NULL CHECK (effort_cap BETWEEN 0 AND 10),
    PRIMARY KEY (rule_set_id, band)
);

-- The minimal clinically important difference applied to each outcome instrument's change.
CREATE TABLE practice_rule_mcid (
    rule_set_id    uuid             NOT NULL REFERENCES practice_rule_set (id),
    instrument     varchar(20)      NOT NULL,
    points         double precision NOT NULL CHECK (points > 0),
    percent        double precision CHECK (percent IS NULL OR percent > 0),
    source         varchar(500)     NOT NULL,
    source_section varchar(100)     NOT NULL,
    evidence_tag   varchar(20)      NOT NULL CHECK (evidence_tag IN ('VERIFIED', 'SECONDARY', 'FROM_MEMORY', 'COMMON_PRACTICE')),
    confidence     varchar(20)      NOT NULL CHECK (confidence IN ('HIGH', 'MEDIUM', 'LOW', 'NOT_STATED')),
    PRIMARY KEY (rule_set_id, instrument)
);

-- One rule: when the measurement or derived value compares to the threshold, the rule fires and caps the
-- region's band. "required": signing is refused while the value is missing; "also_needs": values (comma-separated
-- keys) that must be present to sign once the rule fires.
CREATE TABLE practice_rule (
    rule_set_id    uuid             NOT NULL REFERENCES practice_rule_set (id),
    position       integer          NOT NULL CHECK (position >= 0),
    code           varchar(80)      NOT NULL,
    measurement    varchar(60)      NOT NULL,
    comparison     varchar(10)      NOT NULL CHECK (comparison IN ('LT', 'LE', 'GT', 'GE', 'EQ', 'ABS_GT', 'ABS_GE')),
    threshold      double precision NOT NULL,
    unit           varchar(30)      NOT NULL,
    region         varchar(20)      NOT NULL CHECK (region IN ('SHOULDER', 'LUMBOPELVIC')),
    capped_band    varchar(10)      NOT NULL CHECK (capped_band IN ('HOLD', 'BAND_1', 'BAND_2', 'BAND_3', 'OPEN')),
    source         varchar(500)     NOT NULL,
    source_section varchar(100)     NOT NULL,
    evidence_tag   varchar(20)      NOT NULL CHECK (evidence_tag IN ('VERIFIED', 'SECONDARY', 'FROM_MEMORY', 'COMMON_PRACTICE')),
    confidence     varchar(20)      NOT NULL CHECK (confidence IN ('HIGH', 'MEDIUM', 'LOW', 'NOT_STATED')),
    required       boolean          NOT NULL,
    also_needs     varchar(500)     NOT NULL DEFAULT '',
    PRIMARY KEY (rule_set_id, position),
    CONSTRAINT practice_rule_code_uq UNIQUE (rule_set_id, code)
);

CREATE TRIGGER practice_rule_set_append_only BEFORE UPDATE OR DELETE ON practice_rule_set
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER practice_rule_band_plan_append_only BEFORE UPDATE OR DELETE ON practice_rule_band_plan
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER practice_rule_mcid_append_only BEFORE UPDATE OR DELETE ON practice_rule_mcid
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER practice_rule_append_only BEFORE UPDATE OR DELETE ON practice_rule
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
