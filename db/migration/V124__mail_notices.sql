-- E-mail notices through the firm's own SMTP server (com.baysheet.notice): one row of settings, off until the
-- administrator sets them up, with the last failed send for the administration page; the SMTP password is not
-- here (a secret file named at start, as the signing key's). Each person may have an address to be told at.
-- Runs unchanged on H2 2.5 and PostgreSQL 15.
CREATE TABLE mail_setting (
    id INT PRIMARY KEY,
    notices_on BOOLEAN DEFAULT FALSE NOT NULL,
    host VARCHAR(253) DEFAULT '' NOT NULL,
    port INT DEFAULT 587 NOT NULL,
    security VARCHAR(10) DEFAULT 'STARTTLS' NOT NULL,
    username VARCHAR(254) DEFAULT '' NOT NULL,
    from_address VARCHAR(254) DEFAULT '' NOT NULL,
    office_address VARCHAR(200) DEFAULT '' NOT NULL,
    last_failed_notice TEXT,
    last_failure TEXT,
    last_failed_at TIMESTAMP WITH TIME ZONE,
    version BIGINT DEFAULT 0 NOT NULL,
    CONSTRAINT mail_setting_one_row CHECK (id = 1),
    CONSTRAINT mail_setting_security CHECK (security IN ('NONE', 'STARTTLS', 'TLS'))
);
INSERT INTO mail_setting (id) VALUES (1);
ALTER TABLE app_user ADD COLUMN email VARCHAR(254);
