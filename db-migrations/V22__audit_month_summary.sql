-- Counts of audit events per clinic and closed calendar month (UTC), for the manager's activity chart. Derived
-- data, not evidence: a month's counts are computed once from audit_event after the month has ended (its events
-- can no longer change: rows are append-only and stamped with the time of their append), so the chart does not
-- scan a year of events on every view. The activity report still counts from the events themselves.
CREATE TABLE audit_month_summary (
    clinic_id       uuid        NOT NULL,
    month           date        NOT NULL CHECK (extract(day from month) = 1),
    events          bigint      NOT NULL,
    about_patients  bigint      NOT NULL,
    denied          bigint      NOT NULL,
    failed          bigint      NOT NULL,
    computed_at     timestamptz NOT NULL,
    PRIMARY KEY (clinic_id, month)
);
