-- The floor live load reduction method a project chooses instead of its edition's own: the id of a data set in the
-- floorMethods block of engine/editions.json (the IBC alternative, EN 1991-1-1, NBC). NULL, the default for every
-- existing project, is the edition's own method, so their records are unchanged.
ALTER TABLE project ADD COLUMN floor_method VARCHAR(40);
