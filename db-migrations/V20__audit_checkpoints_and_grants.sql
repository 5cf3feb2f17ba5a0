-- Signed checkpoints of each clinic's audit chain head, and the privileges that make the audit rows
-- append-only for the application's own database role (security-audit-interop.md B.2 step 6 and 8, B.3 of the
-- summary table: "App DB role gets INSERT+SELECT only").

-- One row per checkpoint: the head (seq, row_hash) of a chain at created_at, with an HMAC-SHA256 over them made
-- with a key the database never holds (clearance.audit.checkpoint-key). Copies are exported and kept elsewhere,
-- so a truncated tail or a consistently rewritten chain no longer matches them.
CREATE TABLE audit_checkpoint (
    chain_id        uuid         NOT NULL,
    seq             bigint       NOT NULL CHECK (seq > 0),
    row_hash        bytea        NOT NULL CHECK (octet_length(row_hash) = 32),
    created_at      timestamptz  NOT NULL,
    key_id          varchar(40)  NOT NULL,
    mac             bytea        NOT NULL CHECK (octet_length(mac) = 32),
    PRIMARY KEY (chain_id, seq)
);
CREATE INDEX audit_checkpoint_created_idx ON audit_checkpoint (chain_id, created_at DESC);

CREATE TRIGGER audit_checkpoint_append_only BEFORE UPDATE OR DELETE ON audit_checkpoint
    FOR EACH ROW EXECUTE FUNCTION refuse_change();
CREATE TRIGGER audit_checkpoint_no_truncate BEFORE TRUNCATE ON audit_checkpoint
    FOR EACH STATEMENT EXECUTE FUNCTION refuse_truncate();

-- Grants, second wall behind the triggers. The role running this migration is the role the application uses in
-- the default set-up (it owns the tables). An owner keeps the right to grant privileges back to itself, but
-- without them every UPDATE, DELETE or TRUNCATE of an audit row fails with "permission denied" (SQLSTATE 42501)
-- before any trigger runs, even if a trigger was disabled. The chain head must stay updatable: it is not
-- evidence itself (the verifier recomputes everything from the rows and the checkpoints).
REVOKE UPDATE, DELETE, TRUNCATE ON audit_event, audit_checkpoint FROM PUBLIC;
REVOKE UPDATE, DELETE, TRUNCATE ON audit_event, audit_checkpoint FROM CURRENT_USER;
REVOKE DELETE, TRUNCATE ON audit_chain FROM PUBLIC;
REVOKE DELETE, TRUNCATE ON audit_chain FROM CURRENT_USER;

-- A NOLOGIN group role with exactly the audit rights a separate runtime login role needs (DEVELOPERS.md "The audit trail",
-- "Database roles"). Creating roles needs CREATEROLE, which the migration role usually lacks; then a DBA runs
-- db/admin/audit-runtime-role.sql once and this block only grants to the role that now exists.
DO $$
BEGIN
    IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'clearance_audit_append') THEN
        IF EXISTS (SELECT 1 FROM pg_roles WHERE rolname = current_user AND (rolsuper OR rolcreaterole)) THEN
            CREATE ROLE clearance_audit_append NOLOGIN;
        ELSE
            RAISE NOTICE 'role clearance_audit_append not created (no CREATEROLE); see db/admin/audit-runtime-role.sql';
            RETURN;
        END IF;
    END IF;
    GRANT SELECT, INSERT ON audit_event, audit_checkpoint TO clearance_audit_append;
    GRANT SELECT, INSERT, UPDATE ON audit_chain TO clearance_audit_append;
END $$;
