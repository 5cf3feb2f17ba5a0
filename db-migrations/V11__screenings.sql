-- Screenings: an identity row per screening of an episode, and append-only versions. A version is edited only
-- while it is a draft; signing freezes it (status SIGNED, or AMENDED for a signed amendment) and the trigger below
-- refuses any later UPDATE or DELETE, whoever issues it. A correction is a new version that names the version it
-- supersedes and the reason; the superseded version stays byte-identical, so its content hash keeps verifying.

CREATE TABLE screening (
    id          uuid PRIMARY KEY,
    clinic_id   uuid        NOT NULL REFERENCES clinic (id),
    patient_id  uuid        NOT NULL REFERENCES patient (id),
    episode_id  uuid        NOT NULL REFERENCES episode (id),
    created_at  timestamptz NOT NULL,
    created_by  uuid        NOT NULL REFERENCES staff_account (id)
);
CREATE INDEX screening_episode_idx ON screening (clinic_id, episode_id, created_at);
CREATE INDEX screening_patient_idx ON screening (clinic_id, patient_id, created_at);
CREATE TRIGGER screening_append_only BEFORE UPDATE OR DELETE ON screening
    FOR EACH ROW EXECUTE FUNCTION refuse_change();

CREATE TABLE screening_version (
    id                          uuid PRIMARY KEY,
    screening_id                uuid          NOT NULL REFERENCES screening (id),
    clinic_id                   uuid          NOT NULL REFERENCES clinic (id),
    version_no                  integer       NOT NULL CHECK (version_no >= 1),
    status                      varchar(10)   NOT NULL CHECK (status IN ('DRAFT', 'SIGNED', 'AMENDED')),
    supersedes_version_id       uuid          REFERENCES screening_version (id),
    change_reason               varchar(2000),
    -- what was entered: measurement values by key (absent or null = not tested) and the red-flag checklist
    measurements                jsonb         NOT NULL,
    -- what the engine made of it: inputs, derived values, findings, suggested bands, change since the previous
    -- signed screening, engine and rules versions. Recomputed while a draft; frozen at signing.
    snapshot                    jsonb         NOT NULL,
    rule_set_id                 uuid          NOT NULL REFERENCES practice_rule_set (id),
    rules_version               integer       NOT NULL,
    engine_version              varchar(40)   NOT NULL,
    suggested_shoulder_band     varchar(10)   NOT NULL,
    suggested_lumbopelvic_band  varchar(10)   NOT NULL,
    -- the clinician's decision: the band confirmed or chosen instead of the suggestion (then with a reason)
    shoulder_band               varchar(10),
    lumbopelvic_band            varchar(10),
    shoulder_override_reason    varchar(2000),
    lumbopelvic_override_reason varchar(2000),
    red_flags_open              boolean       NOT NULL DEFAULT false,
    created_by                  uuid          NOT NULL REFERENCES staff_account (id),
    created_at                  timestamptz   NOT NULL,
    updated_at                  timestamptz   NOT NULL,
    signed_by                   uuid          REFERENCES staff_account (id),
    signed_at                   timestamptz,
    -- SHA-256 of the canonical content (ScreeningContentHash), set when signing
    content_hash                bytea,
    lock_version                bigint        NOT NULL DEFAULT 0,
    CONSTRAINT screening_version_no_uq UNIQUE (screening_id, version_no),
    CONSTRAINT screening_version_bands CHECK (
        suggested_shoulder_band IN ('HOLD', 'BAND_1', 'BAND_2', 'BAND_3', 'OPEN')
        AND suggested_lumbopelvic_band IN ('HOLD', 'BAND_1', 'BAND_2', 'BAND_3', 'OPEN')
        AND (shoulder_band IS NULL OR shoulder_band IN ('HOLD', 'BAND_1', 'BAND_2', 'BAND_3', 'OPEN'))
        AND (lumbopelvic_band IS NULL OR lumbopelvic_band IN ('HOLD', 'BAND_1', 'BAND_2', 'BAND_3', 'OPEN'))),
    -- a later version always names the version it corrects and why
    CONSTRAINT screening_version_amendment CHECK (
        (version_no = 1 AND supersedes_version_id IS NULL AND change_reason IS NULL)
        OR (version_no > 1 AND supersedes_version_id IS NOT NULL AND length(trim(change_reason)) > 0)),
    CONSTRAINT screening_version_amended_status CHECK (status <> 'AMENDED' OR version_no > 1),
    -- a signed version carries its signer, time, hash and the decided bands
    CONSTRAINT screening_version_signed CHECK (status = 'DRAFT' OR (
        signed_by IS NOT NULL AND signed_at IS NOT NULL AND octet_length(content_hash) = 32
        AND shoulder_band IS NOT NULL AND lumbopelvic_band IS NOT NULL)),
    -- overriding a suggestion needs a reason
    CONSTRAINT screening_version_override_reason CHECK (
        (shoulder_band IS NULL OR shoulder_band = suggested_shoulder_band OR length(trim(shoulder_override_reason)) > 0)
        AND (lumbopelvic_band IS NULL OR lumbopelvic_band = suggested_lumbopelvic_band
             OR length(trim(lumbopelvic_override_reason)) > 0))
);
-- at most one open draft per screening
CREATE UNIQUE INDEX screening_version_one_draft_uq ON screening_version (screening_id) WHERE status = 'DRAFT';
CREATE INDEX screening_version_clinic_status_idx ON screening_version (clinic_id, status);

-- Drafts may change (and be discarded); a signed or amended version never again, and a version's identity
-- (screening, number, clinic, predecessor) never changes.
CREATE OR REPLACE FUNCTION screening_version_guard() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    IF OLD.status <> 'DRAFT' THEN
        RAISE EXCEPTION 'screening version % is signed and read-only: % refused', OLD.id, TG_OP
            USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    IF TG_OP = 'DELETE' THEN
        RETURN OLD;
    END IF;
    IF NEW.id <> OLD.id OR NEW.screening_id <> OLD.screening_id OR NEW.version_no <> OLD.version_no
            OR NEW.clinic_id <> OLD.clinic_id
            OR NEW.supersedes_version_id IS DISTINCT FROM OLD.supersedes_version_id
            OR NEW.created_by <> OLD.created_by OR NEW.created_at <> OLD.created_at THEN
        RAISE EXCEPTION 'the identity of screening version % cannot change', OLD.id
            USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    RETURN NEW;
END $$;

CREATE TRIGGER screening_version_signed_read_only BEFORE UPDATE OR DELETE ON screening_version
    FOR EACH ROW EXECUTE FUNCTION screening_version_guard();
CREATE TRIGGER screening_version_no_truncate BEFORE TRUNCATE ON screening_version
    FOR EACH STATEMENT EXECUTE FUNCTION refuse_truncate();
