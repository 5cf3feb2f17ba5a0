-- A computed envelope for an episode: every club × swing pattern at one cycle time, from one signed screening
-- version, one practice-rules version and one engine version. Inputs and outputs are kept whole (JSON) so the
-- record shows what was computed and from what, even after code, rules or clubs change. Append-only: a changed
-- input makes a new snapshot; an unchanged one (same inputs digest) is reused.
CREATE TABLE envelope_snapshot (
    id                  uuid PRIMARY KEY,
    clinic_id           uuid             NOT NULL REFERENCES clinic (id),
    episode_id          uuid             NOT NULL REFERENCES episode (id),
    patient_id          uuid             NOT NULL REFERENCES patient (id),
    screening_id        uuid             NOT NULL,
    screening_version   integer          NOT NULL,
    cycle_time_s        double precision NOT NULL CHECK (cycle_time_s > 0),
    inputs_digest       char(64)         NOT NULL,
    inputs              jsonb            NOT NULL,
    outputs             jsonb            NOT NULL,
    engine_version      varchar(40)      NOT NULL,
    rules_version       integer          NOT NULL,
    computed_at         timestamptz      NOT NULL,
    computed_by         uuid             NOT NULL REFERENCES staff_account (id)
);
CREATE INDEX envelope_snapshot_episode_idx ON envelope_snapshot (clinic_id, episode_id, computed_at DESC);
CREATE INDEX envelope_snapshot_digest_idx ON envelope_snapshot (clinic_id, episode_id, inputs_digest);

CREATE TRIGGER envelope_snapshot_append_only BEFORE UPDATE OR DELETE ON envelope_snapshot
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
