-- Run once per PostgreSQL cluster by a DBA (a role with CREATEROLE or a superuser), connected to the
-- application's database after its migrations ran. It creates the NOLOGIN group role that holds exactly the
-- audit rights of the application at run time: rows of the audit trail may be read and appended, never changed.
-- A separate runtime login role (for example clearance_app) is then made a member and also gets its
-- ordinary rights on the feature tables; Flyway keeps running as the owner role. See DEVELOPERS.md, "The audit trail".
DO $$
BEGIN
    IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'clearance_audit_append') THEN
        CREATE ROLE clearance_audit_append NOLOGIN;
    END IF;
END $$;
REVOKE ALL ON audit_event, audit_checkpoint, audit_chain FROM clearance_audit_append;
GRANT SELECT, INSERT ON audit_event, audit_checkpoint TO clearance_audit_append;
GRANT SELECT, INSERT, UPDATE ON audit_chain TO clearance_audit_append;
