-- Roof snow (ASCE 7 Chapter 7): the project's snow site, all NULL where the project gives no ground snow load
-- (then no member carries snow). C_e is the table's (terrain and exposure) or given directly; C_t likewise.
ALTER TABLE project ADD COLUMN ground_snow DOUBLE PRECISION;
ALTER TABLE project ADD COLUMN snow_terrain VARCHAR(20);
ALTER TABLE project ADD COLUMN snow_exposure VARCHAR(20);
ALTER TABLE project ADD COLUMN snow_exposure_factor DOUBLE PRECISION;
ALTER TABLE project ADD COLUMN snow_thermal VARCHAR(20);
ALTER TABLE project ADD COLUMN snow_thermal_factor DOUBLE PRECISION;
ALTER TABLE project ADD COLUMN snow_risk_category VARCHAR(4);
-- A roof level's shape and surface for its snow load: NULL shape is monoslope (flat included); W for rain-on-snow.
ALTER TABLE building_level ADD COLUMN roof_shape VARCHAR(20);
ALTER TABLE building_level ADD COLUMN roof_slippery BOOLEAN DEFAULT FALSE NOT NULL;
ALTER TABLE building_level ADD COLUMN eave_to_ridge DOUBLE PRECISION;
