-- Alerts raised from session logs for the clinician: pain during above the practice rule's limit, pain not settled
-- next morning, weekly pain rising, a configuration heavier than the current plan step, an acute:chronic load ratio
-- above the rule's caution level. An alert is never deleted and never rewritten; the only change allowed is its one acknowledgement.

CREATE TABLE training_alert (
    id               uuid PRIMARY KEY,
    clinic_id        uuid         NOT NULL REFERENCES clinic (id),
    patient_id       uuid         NOT NULL REFERENCES patient (id),
    episode_id       uuid         NOT NULL REFERENCES episode (id),
    session_log_id   uuid         NOT NULL REFERENCES session_log (id),
    -- the log version or next-morning entry that raised it (one alert of a kind per source)
    source_id        uuid         NOT NULL,
    kind             varchar(30)  NOT NULL
        CHECK (kind IN ('PAIN_DURING', 'PAIN_NOT_SETTLED', 'PAIN_RISING_WEEKLY', 'HEAVIER_THAN_STEP',
                        'LOAD_RATIO')),
    session_date     date         NOT NULL,
    step_number      integer      NOT NULL CHECK (step_number >= 1),
    regress_to_step  integer      NOT NULL CHECK (regress_to_step >= 1),
    observed         double precision,
    threshold        double precision,
    rules_version    integer      NOT NULL,
    raised_at        timestamptz  NOT NULL,
    acknowledged_at  timestamptz,
    acknowledged_by  uuid         REFERENCES staff_account (id),
    ack_note         varchar(1000),
    version          bigint       NOT NULL DEFAULT 0,
    CONSTRAINT training_alert_source_uq UNIQUE (source_id, kind),
    CHECK ((acknowledged_at IS NULL) = (acknowledged_by IS NULL))
);
CREATE INDEX training_alert_open_idx ON training_alert (clinic_id, acknowledged_at, raised_at DESC);
CREATE INDEX training_alert_episode_idx ON training_alert (clinic_id, episode_id, raised_at DESC);

-- Allows exactly one change: an open alert becomes acknowledged (with who, when and an optional note).
CREATE OR REPLACE FUNCTION training_alert_acknowledge_only() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    IF TG_OP = 'UPDATE'
       AND OLD.acknowledged_at IS NULL AND NEW.acknowledged_at IS NOT NULL
       AND (NEW.id, NEW.clinic_id, NEW.patient_id, NEW.episode_id, NEW.session_log_id, NEW.source_id, NEW.kind,
            NEW.session_date, NEW.step_number, NEW.regress_to_step, NEW.observed, NEW.threshold, NEW.rules_version,
            NEW.raised_at)
           IS NOT DISTINCT FROM
           (OLD.id, OLD.clinic_id, OLD.patient_id, OLD.episode_id, OLD.session_log_id, OLD.source_id, OLD.kind,
            OLD.session_date, OLD.step_number, OLD.regress_to_step, OLD.observed, OLD.threshold, OLD.rules_version,
            OLD.raised_at) THEN
        RETURN NEW;
    END IF;
    RAISE EXCEPTION 'rows of % change only by one acknowledgement: % refused', TG_TABLE_NAME, TG_OP
        USING ERRCODE = 'integrity_constraint_violation';
END $$;

CREATE TRIGGER training_alert_acknowledge_only BEFORE UPDATE OR DELETE ON training_alert
    FOR EACH ROW EXECUTE FUNCTION training_alert_acknowledge_only();
