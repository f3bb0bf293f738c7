-- The login throttle's counters, shared by every server on the database: one row per username ('u') and
-- per client address ('a'), locked (SELECT ... FOR UPDATE) and bumped in the same transaction as the check,
-- so concurrent guesses are each counted. Runs unchanged on H2 2.5 (MODE=PostgreSQL) and PostgreSQL 15.
CREATE TABLE login_attempt (
    kind          VARCHAR(1)  NOT NULL CHECK (kind IN ('u', 'a')),
    subject       VARCHAR(64) NOT NULL,
    failures      INT         NOT NULL,  -- wrong passwords in a row: drives the wait
    refused       INT         NOT NULL,  -- attempts refused during the current wait (one audit row per episode)
    attempts      INT         NOT NULL,  -- all failed or refused attempts since the last login, told at that login
    last_failure  TIMESTAMP WITH TIME ZONE NOT NULL,
    wait_until    TIMESTAMP WITH TIME ZONE NOT NULL,
    CONSTRAINT pk_login_attempt PRIMARY KEY (kind, subject)
);

-- the per-failure rows of V100 are replaced by the counters above
DROP TABLE login_failure;
