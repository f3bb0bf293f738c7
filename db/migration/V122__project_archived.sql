-- An archived project stays in the store and out of the default project list; its model takes no change until it is
-- un-archived (store.ProjectStore). Every existing project is current. Runs unchanged on H2 2.5 and PostgreSQL 15.
ALTER TABLE project ADD COLUMN archived BOOLEAN DEFAULT FALSE NOT NULL;
