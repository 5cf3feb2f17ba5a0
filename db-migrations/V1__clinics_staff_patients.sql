-- Clinics (tenants), staff accounts, login failures, patients, episodes, consents, red-flag checks and referrals.
-- Every tenant-owned row carries clinic_id; every query in the application is scoped by it.

CREATE TABLE clinic (
    id              uuid PRIMARY KEY,
    name            varchar(200) NOT NULL,
    contact_phone   varchar(60),
    contact_email   varchar(200),
    address         varchar(400),
    retention_years integer      NOT NULL DEFAULT 10 CHECK (retention_years BETWEEN 1 AND 100),
    created_at      timestamptz  NOT NULL,
    version         bigint       NOT NULL DEFAULT 0
);

CREATE TABLE staff_account (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    email           varchar(254) NOT NULL,
    display_name    varchar(200) NOT NULL,
    role            varchar(20)  NOT NULL CHECK (role IN ('CLINICIAN', 'TRAINER', 'MANAGER', 'ADMIN')),
    password_hash   varchar(500) NOT NULL,
    enabled         boolean      NOT NULL DEFAULT true,
    unit_system     varchar(10)  NOT NULL DEFAULT 'METRIC' CHECK (unit_system IN ('METRIC', 'IMPERIAL')),
    created_at      timestamptz  NOT NULL,
    version         bigint       NOT NULL DEFAULT 0
);
-- Sign-in names are unique across the installation, compared case-insensitively.
CREATE UNIQUE INDEX staff_account_email_uq ON staff_account (lower(email));
CREATE INDEX staff_account_clinic_idx ON staff_account (clinic_id);

-- Failed sign-ins, counted in a sliding window per account and per client address (throttling).
CREATE TABLE login_failure (
    id              bigserial PRIMARY KEY,
    username        varchar(254) NOT NULL,
    client_address  varchar(64)  NOT NULL,
    occurred_at     timestamptz  NOT NULL
);
CREATE INDEX login_failure_user_idx ON login_failure (lower(username), occurred_at);
CREATE INDEX login_failure_addr_idx ON login_failure (client_address, occurred_at);

CREATE TABLE patient (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    code            varchar(40)  NOT NULL,
    full_name       varchar(200),
    date_of_birth   date         NOT NULL,
    sex             varchar(10)  NOT NULL CHECK (sex IN ('FEMALE', 'MALE', 'OTHER')),
    stature_m       double precision NOT NULL CHECK (stature_m BETWEEN 0.5 AND 2.5),
    body_mass_kg    double precision NOT NULL CHECK (body_mass_kg BETWEEN 10 AND 300),
    dominant_hand   varchar(10)  NOT NULL CHECK (dominant_hand IN ('LEFT', 'RIGHT', 'EITHER')),
    contact         varchar(400),
    created_at      timestamptz  NOT NULL,
    updated_at      timestamptz  NOT NULL,
    version         bigint       NOT NULL DEFAULT 0,
    CONSTRAINT patient_code_uq UNIQUE (clinic_id, code)
);
CREATE INDEX patient_clinic_name_idx ON patient (clinic_id, lower(full_name));

CREATE TABLE episode (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    patient_id      uuid         NOT NULL REFERENCES patient (id),
    region          varchar(20)  NOT NULL CHECK (region IN ('SHOULDER', 'LUMBOPELVIC', 'BOTH')),
    shoulder_side   varchar(10)  CHECK (shoulder_side IN ('LEFT', 'RIGHT')),
    injury_date     date         NOT NULL,
    surgery         boolean      NOT NULL DEFAULT false,
    goal            varchar(1000) NOT NULL,
    status          varchar(20)  NOT NULL CHECK (status IN ('ACTIVE', 'CLOSED')),
    created_at      timestamptz  NOT NULL,
    created_by      uuid         NOT NULL REFERENCES staff_account (id),
    version         bigint       NOT NULL DEFAULT 0,
    CHECK ((region = 'LUMBOPELVIC') = (shoulder_side IS NULL))
);
CREATE INDEX episode_patient_idx ON episode (clinic_id, patient_id);

-- Consent to share a plan with a named trainer, recorded with its date; withdrawal keeps the row.
CREATE TABLE share_consent (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    patient_id      uuid         NOT NULL REFERENCES patient (id),
    trainer_name    varchar(200) NOT NULL,
    trainer_email   varchar(254),
    consented_on    date         NOT NULL,
    withdrawn_on    date,
    recorded_by     uuid         NOT NULL REFERENCES staff_account (id),
    recorded_at     timestamptz  NOT NULL,
    version         bigint       NOT NULL DEFAULT 0
);
CREATE INDEX share_consent_patient_idx ON share_consent (clinic_id, patient_id);

-- A dated red-flag checklist for an episode (at intake and at every screening). Append-only.
CREATE TABLE red_flag_check (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    episode_id      uuid         NOT NULL REFERENCES episode (id),
    context         varchar(20)  NOT NULL CHECK (context IN ('INTAKE', 'SCREENING', 'RECHECK')),
    flags           varchar(1000) NOT NULL,
    checked_at      timestamptz  NOT NULL,
    checked_by      uuid         NOT NULL REFERENCES staff_account (id)
);
CREATE INDEX red_flag_check_episode_idx ON red_flag_check (episode_id, checked_at);

-- The referral a clinician records after a red flag; it releases the hold of the checks before it.
CREATE TABLE referral (
    id              uuid PRIMARY KEY,
    clinic_id       uuid         NOT NULL REFERENCES clinic (id),
    episode_id      uuid         NOT NULL REFERENCES episode (id),
    referred_to     varchar(300) NOT NULL,
    note            varchar(2000),
    recorded_at     timestamptz  NOT NULL,
    recorded_by     uuid         NOT NULL REFERENCES staff_account (id)
);
CREATE INDEX referral_episode_idx ON referral (episode_id, recorded_at);

CREATE OR REPLACE FUNCTION refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    RAISE EXCEPTION 'rows of % are append-only: % refused', TG_TABLE_NAME, TG_OP
        USING ERRCODE = 'integrity_constraint_violation';
END $$;

CREATE TRIGGER red_flag_check_append_only BEFORE UPDATE OR DELETE ON red_flag_check
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER referral_append_only BEFORE UPDATE OR DELETE ON referral
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
