-- Session logs of the trainer workspace. A log is an append-only chain of versions: the first version is what the
-- trainer (or clinician) recorded after the session, every later version is a correction with a mandatory reason.
-- The next-morning pain is a separate append-only observation of the same log (recorded the next day, correctable
-- the same way). Nothing here is ever updated or deleted: the database refuses it, not just the code.
-- plan_id / plan_version / step_number name the issued plan step the session belongs to (the plan feature's V40).

CREATE TABLE session_log (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    patient_id      uuid         NOT NULL REFERENCES patient (id),
    episode_id      uuid         NOT NULL REFERENCES episode (id),
    created_by      uuid         NOT NULL REFERENCES staff_account (id),
    created_at      timestamptz  NOT NULL
);
CREATE INDEX session_log_episode_idx ON session_log (clinic_id, episode_id);

CREATE TABLE session_log_version (
    id                    uuid PRIMARY KEY,
    clinic_id             uuid         NOT NULL REFERENCES clinic (id),
    session_log_id        uuid         NOT NULL REFERENCES session_log (id),
    version               integer      NOT NULL CHECK (version >= 1),
    plan_id               uuid         NOT NULL REFERENCES plan (id),
    plan_version          integer      NOT NULL CHECK (plan_version >= 1),
    step_number           integer      NOT NULL CHECK (step_number >= 1),
    session_date          date         NOT NULL,
    as_planned            boolean      NOT NULL,
    -- what was done (copied from the step when done as planned)
    club_id               uuid,
    club_name             varchar(200),
    club_mass_kg          double precision NOT NULL CHECK (club_mass_kg > 0 AND club_mass_kg <= 50),
    grip_mark_cm          double precision NOT NULL CHECK (grip_mark_cm >= 0 AND grip_mark_cm <= 150),
    cycle_time_s          double precision NOT NULL CHECK (cycle_time_s >= 0.3 AND cycle_time_s <= 20),
    sets                  integer      NOT NULL CHECK (sets BETWEEN 1 AND 50),
    reps                  integer      NOT NULL CHECK (reps BETWEEN 1 AND 500),
    -- demand-to-capacity ratio D of what was done; null when it was a configuration the plan does not contain
    demand_ratio          double precision CHECK (demand_ratio >= 0),
    -- the plan step as issued (snapshot, so adherence never changes when the plan does)
    planned_club_id       uuid,
    planned_club_mass_kg  double precision NOT NULL,
    planned_grip_mark_cm  double precision NOT NULL,
    planned_cycle_time_s  double precision NOT NULL,
    planned_sets          integer      NOT NULL,
    planned_reps          integer      NOT NULL,
    planned_demand_ratio  double precision NOT NULL,
    duration_min          integer      NOT NULL CHECK (duration_min BETWEEN 1 AND 600),
    rpe                   integer      NOT NULL CHECK (rpe BETWEEN 0 AND 10),
    -- pain at rest before the session: the baseline the next-morning pain must settle back to
    pain_before           integer      NOT NULL CHECK (pain_before BETWEEN 0 AND 10),
    pain_during           integer      NOT NULL CHECK (pain_during BETWEEN 0 AND 10),
    notes                 varchar(2000),
    reason                varchar(1000),
    recorded_by           uuid         NOT NULL REFERENCES staff_account (id),
    recorded_at           timestamptz  NOT NULL,
    CONSTRAINT session_log_version_uq UNIQUE (session_log_id, version),
    -- a correction always says why; the first entry has nothing to correct
    CONSTRAINT session_log_version_reason_ck CHECK ((version = 1) = (reason IS NULL))
);
CREATE INDEX session_log_version_log_idx ON session_log_version (session_log_id, version DESC);

CREATE TABLE session_morning_pain (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    session_log_id  uuid         NOT NULL REFERENCES session_log (id),
    version         integer      NOT NULL CHECK (version >= 1),
    pain            integer      NOT NULL CHECK (pain BETWEEN 0 AND 10),
    reason          varchar(1000),
    recorded_by     uuid         NOT NULL REFERENCES staff_account (id),
    recorded_at     timestamptz  NOT NULL,
    CONSTRAINT session_morning_pain_uq UNIQUE (session_log_id, version),
    CONSTRAINT session_morning_pain_reason_ck CHECK ((version = 1) = (reason IS NULL))
);

CREATE TRIGGER session_log_append_only BEFORE UPDATE OR DELETE ON session_log
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER session_log_version_append_only BEFORE UPDATE OR DELETE ON session_log_version
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER session_morning_pain_append_only BEFORE UPDATE OR DELETE ON session_morning_pain
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
