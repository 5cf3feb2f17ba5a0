-- Swing patterns: a built-in library (clinic_id NULL, named by a message key, unchangeable) and each clinic's own
-- (named in plain text, retired rather than deleted). Angles are degrees of the straight arm from hanging vertical
-- in the swing plane, forward/up positive; the pattern spans centre − half-arc … centre + half-arc.
CREATE TABLE swing_pattern (
    id                        uuid PRIMARY KEY,
    clinic_id                 uuid REFERENCES clinic (id),
    name_key                  varchar(120),
    name                      varchar(120),
    centre_deg                double precision NOT NULL CHECK (centre_deg BETWEEN -180 AND 180),
    half_arc_deg              double precision NOT NULL CHECK (half_arc_deg > 0 AND half_arc_deg <= 180),
    hands                     smallint         NOT NULL CHECK (hands IN (1, 2)),
    reach                     double precision NOT NULL CHECK (reach >= 0.3 AND reach <= 1),
    kind                      varchar(12)      NOT NULL CHECK (kind IN ('RHYTHMIC', 'SINGLE_ARC')),
    hip_driven                boolean          NOT NULL,
    minimum_lumbopelvic_band  varchar(10) CHECK (minimum_lumbopelvic_band IN ('BAND_1', 'BAND_2', 'BAND_3', 'OPEN')),
    sort_order                integer          NOT NULL DEFAULT 100,
    retired_at                timestamptz,
    created_at                timestamptz      NOT NULL,
    created_by                uuid REFERENCES staff_account (id),
    version                   bigint           NOT NULL DEFAULT 0,
    CHECK ((clinic_id IS NULL) = (name_key IS NOT NULL)),
    CHECK ((clinic_id IS NULL) = (name IS NULL)),
    CHECK (clinic_id IS NOT NULL OR retired_at IS NULL),
    -- A hip-driven pattern always names the lumbopelvic band it needs.
    CHECK (NOT hip_driven OR minimum_lumbopelvic_band IS NOT NULL)
);
CREATE INDEX swing_pattern_clinic_idx ON swing_pattern (clinic_id, retired_at);
CREATE UNIQUE INDEX swing_pattern_active_name_uq ON swing_pattern (clinic_id, lower(name))
    WHERE clinic_id IS NOT NULL AND retired_at IS NULL;

CREATE TRIGGER swing_pattern_never_deleted BEFORE DELETE ON swing_pattern
    FOR EACH ROW EXECUTE FUNCTION equipment_refuse_delete();
-- The built-in library is the same for every clinic: no clinic may change it.
CREATE OR REPLACE FUNCTION refuse_builtin_pattern_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    IF OLD.clinic_id IS NULL THEN
        RAISE EXCEPTION 'built-in swing patterns cannot be changed' USING ERRCODE = 'integrity_constraint_violation';
    END IF;
    RETURN NEW;
END $$;
CREATE TRIGGER swing_pattern_builtin_fixed BEFORE UPDATE ON swing_pattern
    FOR EACH ROW EXECUTE FUNCTION refuse_builtin_pattern_change();

-- The built-in library, described by what the movement is. Reach below 1 = a bent-elbow arc (the hand nearer the
-- shoulder). Hip-driven patterns need Band 2 on the lumbopelvic side by default (the practice rules may ask more).
INSERT INTO swing_pattern (id, clinic_id, name_key, name, centre_deg, half_arc_deg, hands, reach, kind, hip_driven,
                           minimum_lumbopelvic_band, sort_order, created_at) VALUES
 ('00000000-0000-4000-8000-00000000a001', NULL, 'pattern.builtin.twoHandFrontPendulumHip', NULL,
  30, 60, 2, 1.0, 'RHYTHMIC', true, 'BAND_2', 10, now()),
 ('00000000-0000-4000-8000-00000000a002', NULL, 'pattern.builtin.twoHandFrontPendulumLow', NULL,
  0, 45, 2, 1.0, 'RHYTHMIC', false, NULL, 20, now()),
 ('00000000-0000-4000-8000-00000000a003', NULL, 'pattern.builtin.oneHandFrontArcShoulder', NULL,
  45, 45, 1, 1.0, 'RHYTHMIC', false, NULL, 30, now()),
 ('00000000-0000-4000-8000-00000000a004', NULL, 'pattern.builtin.oneHandRaiseOverhead', NULL,
  65, 65, 1, 1.0, 'SINGLE_ARC', false, NULL, 40, now()),
 ('00000000-0000-4000-8000-00000000a005', NULL, 'pattern.builtin.oneHandOverheadBehindHead', NULL,
  130, 30, 1, 0.8, 'SINGLE_ARC', false, NULL, 50, now()),
 ('00000000-0000-4000-8000-00000000a006', NULL, 'pattern.builtin.twoHandSideToSide', NULL,
  0, 35, 2, 1.0, 'RHYTHMIC', false, NULL, 60, now());
