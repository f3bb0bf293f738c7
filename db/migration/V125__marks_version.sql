-- Counts renames of a project's marks: a rename changes what its pages print and no model version, so the
-- pages kept under a project's versions are keyed by this too (read on every request; a count, not a scan).
ALTER TABLE project ADD COLUMN marks_version BIGINT DEFAULT 0 NOT NULL;
