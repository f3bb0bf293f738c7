package com.baysheet.store;

import com.baysheet.review.store.ReviewDatabases;

/** The package queue on the PostgreSQL server of BAYSHEET_TEST_PG_URL (claims by FOR UPDATE SKIP LOCKED); skipped, saying why, without it. */
class PackageJobStorePostgresTest extends PackageJobStoreContract {
    @Override
    Database open() { return ReviewDatabases.postgres(); }
}
