-- The clinic's club inventory. Every length is metres from the knob end, every mass kilograms (SI; the forms
-- accept lb and in and convert exactly). The inertia about the balance point is always stored with its source:
-- MEASURED (pendulum timing, kept beside it), MODELLED (uniform rod plus a point mass at the head centre) or
-- BOUND (m·x_cm·(L − x_cm), the largest any mass distribution on the club can have). A club is never deleted:
-- retiring hides it from new plans and keeps it for the history of plans that used it.
CREATE TABLE club (
    id                      uuid PRIMARY KEY,
    clinic_id               uuid             NOT NULL REFERENCES clinic (id),
    name                    varchar(120)     NOT NULL,
    mass_kg                 double precision NOT NULL CHECK (mass_kg > 0 AND mass_kg <= 50),
    length_m                double precision NOT NULL CHECK (length_m > 0 AND length_m <= 2),
    balance_point_m         double precision NOT NULL CHECK (balance_point_m > 0 AND balance_point_m < length_m),
    handle_length_m         double precision NOT NULL CHECK (handle_length_m >= 0 AND handle_length_m <= length_m),
    head_centre_m           double precision CHECK (head_centre_m > 0 AND head_centre_m <= length_m),
    inertia_source          varchar(10)      NOT NULL CHECK (inertia_source IN ('MEASURED', 'MODELLED', 'BOUND')),
    inertia_cm_kg_m2        double precision NOT NULL CHECK (inertia_cm_kg_m2 > 0),
    pendulum_pivot_m        double precision CHECK (pendulum_pivot_m > 0),
    pendulum_swings         integer          CHECK (pendulum_swings > 0),
    pendulum_seconds        double precision CHECK (pendulum_seconds > 0),
    retired_at              timestamptz,
    retired_by              uuid REFERENCES staff_account (id),
    created_at              timestamptz      NOT NULL,
    created_by              uuid             NOT NULL REFERENCES staff_account (id),
    updated_at              timestamptz      NOT NULL,
    updated_by              uuid             NOT NULL REFERENCES staff_account (id),
    version                 bigint           NOT NULL DEFAULT 0,
    -- A pendulum reading is stored whole or not at all, and only for a measured inertia.
    CHECK ((pendulum_pivot_m IS NULL) = (pendulum_swings IS NULL)
       AND (pendulum_swings IS NULL) = (pendulum_seconds IS NULL)),
    CHECK (pendulum_pivot_m IS NULL OR inertia_source = 'MEASURED'),
    CHECK (inertia_source <> 'MODELLED' OR head_centre_m IS NOT NULL),
    CHECK ((retired_at IS NULL) = (retired_by IS NULL))
);
CREATE INDEX club_clinic_idx ON club (clinic_id, retired_at, mass_kg);
-- Two clubs in service may not share a name (the trainer must know which one is meant); retired names are free.
CREATE UNIQUE INDEX club_active_name_uq ON club (clinic_id, lower(name)) WHERE retired_at IS NULL;

-- Clubs are retired, never deleted.
CREATE OR REPLACE FUNCTION equipment_refuse_delete() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    RAISE EXCEPTION 'rows of % are kept for history: DELETE refused', TG_TABLE_NAME
        USING ERRCODE = 'integrity_constraint_violation';
END $$;
CREATE TRIGGER club_never_deleted BEFORE DELETE ON club FOR EACH ROW EXECUTE FUNCTION equipment_refuse_delete();
