-- Indexes for the manager's audit browser at a million events and more: every filter pairs with the keyset
-- order (occurred_at DESC, seq DESC), so a page is an index range scan that stops after one page of rows.
-- They replace V3's time indexes, which lacked the seq tie-breaker.
DROP INDEX audit_event_clinic_time_idx;
DROP INDEX audit_event_patient_idx;
DROP INDEX audit_event_actor_idx;
DROP INDEX audit_event_action_idx;

CREATE INDEX audit_event_clinic_time_idx ON audit_event (clinic_id, occurred_at DESC, seq DESC);
CREATE INDEX audit_event_patient_idx ON audit_event (clinic_id, patient_id, occurred_at DESC, seq DESC);
CREATE INDEX audit_event_actor_idx ON audit_event (clinic_id, actor_id, occurred_at DESC, seq DESC);
CREATE INDEX audit_event_action_idx ON audit_event (clinic_id, action, occurred_at DESC, seq DESC);
-- Denied and failed attempts are rare among reads and changes: a partial index finds them without a scan.
CREATE INDEX audit_event_not_success_idx ON audit_event (clinic_id, occurred_at DESC, seq DESC)
    WHERE outcome <> 'SUCCESS';
-- Every event about one record (a screening's create, sign and overrides; a plan's shares) for the reports.
CREATE INDEX audit_event_object_idx ON audit_event (clinic_id, object_type, object_id);
