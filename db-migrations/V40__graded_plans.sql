-- Graded plans (engine.md §7): one plan per episode, kept as numbered versions. A version is a draft the
-- clinician adjusts (optimistic locking on lock_version) until it is issued; an issued version is signed and
-- read-only, and the database itself refuses any change to it or to its parts. A change makes a new version.

CREATE TABLE plan (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    episode_id      uuid         NOT NULL REFERENCES episode (id),
    patient_id      uuid         NOT NULL REFERENCES patient (id),
    created_at      timestamptz  NOT NULL,
    created_by      uuid         NOT NULL REFERENCES staff_account (id),
    version         bigint       NOT NULL DEFAULT 0,
    CONSTRAINT plan_episode_uq UNIQUE (clinic_id, episode_id)
);
CREATE INDEX plan_patient_idx ON plan (clinic_id, patient_id);

-- One version of a plan: the snapshot of everything it was computed from (source screening, practice-rules
-- version, engine version, inputs, the envelope snapshot the clinician reviewed) and the clinician's settings. Screening and club ids are plain references:
-- the plan keeps its own copy of every value it shows, so it never changes when those records change later.
CREATE TABLE plan_version (
    id                       uuid PRIMARY KEY,
    clinic_id                uuid         NOT NULL REFERENCES clinic (id),
    plan_id                  uuid         NOT NULL REFERENCES plan (id),
    number                   integer      NOT NULL CHECK (number >= 1),
    status                   varchar(10)  NOT NULL CHECK (status IN ('DRAFT', 'ISSUED')),
    source_screening_id      uuid         NOT NULL,
    source_screening_version integer      NOT NULL CHECK (source_screening_version >= 1),
    rules_version            integer      NOT NULL CHECK (rules_version >= 1),
    envelope_snapshot_id     uuid,
    engine_version           varchar(120) NOT NULL,
    band                     varchar(10)  NOT NULL CHECK (band IN ('BAND_1', 'BAND_2', 'BAND_3', 'OPEN')),
    pattern_id               uuid         NOT NULL,
    pattern_name             varchar(200) NOT NULL,
    target_club_id           uuid,
    target_grip_mark_cm      double precision CHECK (target_grip_mark_cm >= 0),
    target_cycle_time_s      double precision CHECK (target_cycle_time_s > 0),
    continue_provisionally   boolean      NOT NULL,
    step_unit                varchar(10)  NOT NULL CHECK (step_unit IN ('SESSIONS', 'DAYS')),
    step_length              integer      NOT NULL CHECK (step_length BETWEEN 1 AND 60),
    sessions_per_week        integer      NOT NULL CHECK (sessions_per_week BETWEEN 1 AND 14),
    starts_on                date         NOT NULL,
    step_limit               double precision NOT NULL CHECK (step_limit >= 0),
    pain_during_limit        integer      NOT NULL CHECK (pain_during_limit BETWEEN 0 AND 10),
    inputs                   text         NOT NULL,
    outcome_key              varchar(120),
    outcome_args             varchar(1000),
    content_sha256           varchar(64) CHECK (length(content_sha256) = 64),
    created_at               timestamptz  NOT NULL,
    created_by               uuid         NOT NULL REFERENCES staff_account (id),
    issued_at                timestamptz,
    issued_by                uuid         REFERENCES staff_account (id),
    lock_version             bigint       NOT NULL DEFAULT 0,
    CONSTRAINT plan_version_number_uq UNIQUE (plan_id, number),
    CONSTRAINT plan_version_target_whole CHECK ((target_club_id IS NULL) = (target_grip_mark_cm IS NULL)
        AND (target_club_id IS NULL) = (target_cycle_time_s IS NULL)),
    CONSTRAINT plan_version_issued_signed CHECK ((status = 'ISSUED')
        = (issued_at IS NOT NULL AND issued_by IS NOT NULL AND content_sha256 IS NOT NULL))
);
-- At most one draft per plan: the clinician works on one change at a time.
CREATE UNIQUE INDEX plan_version_one_draft_uq ON plan_version (plan_id) WHERE status = 'DRAFT';
CREATE INDEX plan_version_plan_idx ON plan_version (clinic_id, plan_id, number DESC);

-- Sets × reps and effort cap (CR-10) for steps in each load band.
CREATE TABLE plan_band_dose (
    plan_version_id uuid        NOT NULL REFERENCES plan_version (id),
    band            varchar(10) NOT NULL CHECK (band IN ('BAND_1', 'BAND_2', 'BAND_3', 'OPEN')),
    sets            integer     NOT NULL CHECK (sets BETWEEN 1 AND 20),
    reps            integer     NOT NULL CHECK (reps BETWEEN 1 AND 200),
    effort_cap      integer     NOT NULL CHECK (effort_cap BETWEEN 0 AND 10),
    PRIMARY KEY (plan_version_id, band)
);

-- States the clinician pinned (the plan must pass through them, in this order) or removed (the plan avoids them).
CREATE TABLE plan_adjustment (
    plan_version_id uuid        NOT NULL REFERENCES plan_version (id),
    position        integer     NOT NULL CHECK (position >= 0),
    kind            varchar(10) NOT NULL CHECK (kind IN ('PIN', 'REMOVE')),
    club_id         uuid        NOT NULL,
    grip_mark_cm    double precision NOT NULL CHECK (grip_mark_cm >= 0),
    cycle_time_s    double precision NOT NULL CHECK (cycle_time_s > 0),
    PRIMARY KEY (plan_version_id, position)
);

-- The steps of a version, as computed and shown: club (with its name and mass at the time), grip mark, cycle time,
-- dose, demand ratio D and its binding constraint, whether the step lies beyond the current band, the gate before it.
CREATE TABLE plan_step (
    plan_version_id    uuid         NOT NULL REFERENCES plan_version (id),
    number             integer      NOT NULL CHECK (number >= 1),
    club_id            uuid         NOT NULL,
    club_name          varchar(200) NOT NULL,
    club_mass_kg       double precision NOT NULL CHECK (club_mass_kg > 0),
    grip_mark_cm       double precision NOT NULL CHECK (grip_mark_cm >= 0),
    cycle_time_s       double precision NOT NULL CHECK (cycle_time_s > 0),
    changed_dial       varchar(12)  CHECK (changed_dial IN ('CLUB', 'GRIP_MARK', 'CYCLE_TIME')),
    sets               integer      NOT NULL CHECK (sets >= 1),
    reps               integer      NOT NULL CHECK (reps >= 1),
    effort_cap         integer      NOT NULL CHECK (effort_cap BETWEEN 0 AND 10),
    demand_ratio       double precision NOT NULL CHECK (demand_ratio >= 0),
    rise               double precision NOT NULL,
    binding_constraint varchar(20)  NOT NULL,
    provisional        boolean      NOT NULL,
    gate               varchar(20)  NOT NULL CHECK (gate IN ('NONE', 'RESCREEN_BEFORE')),
    pinned             boolean      NOT NULL,
    starts_on          date         NOT NULL,
    PRIMARY KEY (plan_version_id, number)
);

-- An issued version is read-only: no UPDATE, no DELETE (a draft may still be edited, issued or discarded).
CREATE OR REPLACE FUNCTION plan_version_read_only_when_issued() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    IF OLD.status = 'ISSUED' THEN
        RAISE EXCEPTION 'issued plan version % is read-only: % refused', OLD.id, TG_OP
            USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    IF TG_OP = 'DELETE' THEN
        RETURN OLD;
    END IF;
    RETURN NEW;
END $$;

CREATE TRIGGER plan_version_issued_read_only BEFORE UPDATE OR DELETE ON plan_version
    FOR EACH ROW EXECUTE FUNCTION plan_version_read_only_when_issued();

-- The parts of an issued version (steps, doses, adjustments) can be neither added, changed nor removed.
CREATE OR REPLACE FUNCTION plan_part_read_only_when_issued() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    IF TG_OP <> 'INSERT' AND EXISTS (SELECT 1 FROM plan_version v
                                     WHERE v.id = OLD.plan_version_id AND v.status = 'ISSUED') THEN
        RAISE EXCEPTION 'rows of % belong to an issued plan version: % refused', TG_TABLE_NAME, TG_OP
            USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    IF TG_OP <> 'DELETE' AND EXISTS (SELECT 1 FROM plan_version v
                                     WHERE v.id = NEW.plan_version_id AND v.status = 'ISSUED') THEN
        RAISE EXCEPTION 'rows of % belong to an issued plan version: % refused', TG_TABLE_NAME, TG_OP
            USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    IF TG_OP = 'DELETE' THEN
        RETURN OLD;
    END IF;
    RETURN NEW;
END $$;

CREATE TRIGGER plan_step_issued_read_only BEFORE INSERT OR UPDATE OR DELETE ON plan_step
    FOR EACH ROW EXECUTE FUNCTION plan_part_read_only_when_issued();
CREATE TRIGGER plan_band_dose_issued_read_only BEFORE INSERT OR UPDATE OR DELETE ON plan_band_dose
    FOR EACH ROW EXECUTE FUNCTION plan_part_read_only_when_issued();
CREATE TRIGGER plan_adjustment_issued_read_only BEFORE INSERT OR UPDATE OR DELETE ON plan_adjustment
    FOR EACH ROW EXECUTE FUNCTION plan_part_read_only_when_issued();

-- TRUNCATE bypasses row triggers: refuse it on every table that holds issued versions.
CREATE TRIGGER plan_version_no_truncate BEFORE TRUNCATE ON plan_version
    FOR EACH STATEMENT EXECUTE FUNCTION refuse_truncate();
CREATE TRIGGER plan_step_no_truncate BEFORE TRUNCATE ON plan_step
    FOR EACH STATEMENT EXECUTE FUNCTION refuse_truncate();
CREATE TRIGGER plan_band_dose_no_truncate BEFORE TRUNCATE ON plan_band_dose
    FOR EACH STATEMENT EXECUTE FUNCTION refuse_truncate();
CREATE TRIGGER plan_adjustment_no_truncate BEFORE TRUNCATE ON plan_adjustment
    FOR EACH STATEMENT EXECUTE FUNCTION refuse_truncate();
