-- A typical level: a level whose bays are those of another level of the same project (typical floors entered
-- once). A linked level keeps no bay rows of its own; the derivation reads its typical's bays, and it keeps its
-- own name, elevation, line loads and members. NULL (every existing row): the level has its own bays. The store
-- makes every linked level an independent copy before it deletes their typical; SET NULL is only the guard for
-- a delete that bypasses the store (a project's cascade deletes the linked rows with it).
-- Runs unchanged on H2 2.5 (MODE=PostgreSQL) and PostgreSQL 15; see ../shared/STACK.md.
ALTER TABLE building_level ADD COLUMN typical_of BIGINT;
ALTER TABLE building_level ADD CONSTRAINT fk_level_typical FOREIGN KEY (typical_of) REFERENCES building_level (id) ON DELETE SET NULL;
CREATE INDEX ix_level_typical ON building_level (typical_of);
