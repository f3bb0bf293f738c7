-- A password someone else set (the administrator adding a user or resetting one, or a --demo account whose
-- password went to the console) is known to more than its owner: it must be changed at the next login.
-- Runs unchanged on H2 2.5 (MODE=PostgreSQL) and PostgreSQL 15; see ../shared/STACK.md.
ALTER TABLE app_user ADD COLUMN must_change_password BOOLEAN DEFAULT FALSE NOT NULL;
