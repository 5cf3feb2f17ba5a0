-- Sharing a plan with a trainer of the clinic, on the patient's recorded consent, and one-time invitations for
-- a trainer who has no account yet. Both keep their history: an ended share or a used invitation never changes again.

CREATE TABLE plan_share (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    plan_id         uuid         NOT NULL REFERENCES plan (id),
    patient_id      uuid         NOT NULL REFERENCES patient (id),
    trainer_id      uuid         NOT NULL REFERENCES staff_account (id),
    consent_id      uuid         NOT NULL REFERENCES share_consent (id),
    shared_at       timestamptz  NOT NULL,
    shared_by       uuid         NOT NULL REFERENCES staff_account (id),
    unshared_at     timestamptz,
    unshared_by     uuid         REFERENCES staff_account (id),
    version         bigint       NOT NULL DEFAULT 0,
    CONSTRAINT plan_share_unshared_whole CHECK ((unshared_at IS NULL) = (unshared_by IS NULL))
);
-- One active share per plan and trainer.
CREATE UNIQUE INDEX plan_share_active_uq ON plan_share (plan_id, trainer_id) WHERE unshared_at IS NULL;
CREATE INDEX plan_share_trainer_idx ON plan_share (clinic_id, trainer_id) WHERE unshared_at IS NULL;
CREATE INDEX plan_share_plan_idx ON plan_share (clinic_id, plan_id);

-- The link carries a random token; only its SHA-256 is stored, so a copy of the database opens no account.
CREATE TABLE trainer_invitation (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    plan_id         uuid         NOT NULL REFERENCES plan (id),
    patient_id      uuid         NOT NULL REFERENCES patient (id),
    consent_id      uuid         NOT NULL REFERENCES share_consent (id),
    email           varchar(254) NOT NULL,
    invited_name    varchar(200) NOT NULL,
    token_sha256    varchar(64)  NOT NULL CHECK (length(token_sha256) = 64),
    created_at      timestamptz  NOT NULL,
    created_by      uuid         NOT NULL REFERENCES staff_account (id),
    expires_at      timestamptz  NOT NULL,
    used_at         timestamptz,
    account_id      uuid         REFERENCES staff_account (id),
    version         bigint       NOT NULL DEFAULT 0,
    CONSTRAINT trainer_invitation_token_uq UNIQUE (token_sha256),
    CONSTRAINT trainer_invitation_expiry CHECK (expires_at > created_at),
    CONSTRAINT trainer_invitation_used_whole CHECK ((used_at IS NULL) = (account_id IS NULL))
);
CREATE INDEX trainer_invitation_plan_idx ON trainer_invitation (clinic_id, plan_id, created_at DESC);

-- An ended share and a used invitation are history: no further UPDATE; neither kind of row is ever deleted.
CREATE OR REPLACE FUNCTION plan_share_keep_history() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    IF TG_OP = 'DELETE' OR OLD.unshared_at IS NOT NULL THEN
        RAISE EXCEPTION 'ended or recorded share % is history: % refused', OLD.id, TG_OP
            USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    RETURN NEW;
END $$;

CREATE OR REPLACE FUNCTION trainer_invitation_keep_history() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    IF TG_OP = 'DELETE' OR OLD.used_at IS NOT NULL THEN
        RAISE EXCEPTION 'used or recorded invitation % is history: % refused', OLD.id, TG_OP
            USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    RETURN NEW;
END $$;

CREATE TRIGGER plan_share_history BEFORE UPDATE OR DELETE ON plan_share
    FOR EACH ROW EXECUTE FUNCTION plan_share_keep_history();
CREATE TRIGGER trainer_invitation_history BEFORE UPDATE OR DELETE ON trainer_invitation
    FOR EACH ROW EXECUTE FUNCTION trainer_invitation_keep_history();
