-- Members' self weight by role, firm defaults in plf (SI projects convert them exactly to kN/m).
-- 0 everywhere (the default) means: not included, and every sheet says so. Bays' dead loads already
-- name a framing allowance, so a nonzero default here could count the framing twice.
ALTER TABLE firm_setting ADD COLUMN sw_infill_beam DOUBLE PRECISION DEFAULT 0 NOT NULL;
ALTER TABLE firm_setting ADD COLUMN sw_grid_beam DOUBLE PRECISION DEFAULT 0 NOT NULL;
ALTER TABLE firm_setting ADD COLUMN sw_girder DOUBLE PRECISION DEFAULT 0 NOT NULL;
ALTER TABLE firm_setting ADD COLUMN sw_column DOUBLE PRECISION DEFAULT 0 NOT NULL;
