package com.baysheet.review.store;

import com.baysheet.store.Database;

/** The same contract on the PostgreSQL server of BAYSHEET_TEST_PG_URL; skipped, saying why, without it. */
class AddedPersonPostgresTest extends AddedPersonContract {
    @Override
    Database open() { return ReviewDatabases.postgres(); }
}
