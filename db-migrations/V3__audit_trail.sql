-- Tamper-evident audit trail: one hash chain per clinic (chain_id = clinic id; a fixed all-zero id holds
-- installation events such as a failed sign-in for an unknown name). Rows are append-only.
CREATE TABLE audit_chain (
    chain_id        uuid PRIMARY KEY,
    last_seq        bigint NOT NULL DEFAULT 0,
    last_hash       bytea  NOT NULL
);

CREATE TABLE audit_event (
    chain_id        uuid         NOT NULL,
    seq             bigint       NOT NULL,
    event_id        uuid         NOT NULL UNIQUE,
    occurred_at     timestamptz  NOT NULL,
    clinic_id       uuid,
    actor_id        uuid,
    actor_name      varchar(254),
    actor_role      varchar(20),
    action          varchar(40)  NOT NULL,
    object_type     varchar(40),
    object_id       varchar(80),
    patient_id      uuid,
    outcome         varchar(20)  NOT NULL CHECK (outcome IN ('SUCCESS', 'DENIED', 'FAILED')),
    client_address  varchar(64),
    request_id      varchar(80),
    detail          varchar(2000),
    prev_hash       bytea        NOT NULL,
    row_hash        bytea        NOT NULL,
    PRIMARY KEY (chain_id, seq),
    CONSTRAINT audit_event_fork_uq UNIQUE (chain_id, prev_hash)
);
CREATE INDEX audit_event_clinic_time_idx ON audit_event (clinic_id, occurred_at DESC);
CREATE INDEX audit_event_patient_idx ON audit_event (clinic_id, patient_id, occurred_at DESC);
CREATE INDEX audit_event_actor_idx ON audit_event (clinic_id, actor_id, occurred_at DESC);
CREATE INDEX audit_event_action_idx ON audit_event (clinic_id, action, occurred_at DESC);

CREATE TRIGGER audit_event_append_only BEFORE UPDATE OR DELETE ON audit_event
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE OR REPLACE FUNCTION refuse_truncate() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    RAISE EXCEPTION 'rows of % are append-only: TRUNCATE refused', TG_TABLE_NAME
        USING ERRCODE = 'integrity_constraint_violation';
END $$;
CREATE TRIGGER audit_event_no_truncate BEFORE TRUNCATE ON audit_event
    FOR EACH STATEMENT EXECUTE FUNCTION refuse_truncate();
