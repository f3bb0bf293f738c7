package com.baysheet.store;

import com.baysheet.review.store.ReviewDatabases;

/** The package queue on H2, where a conditional update decides each claim. */
class PackageJobStoreH2Test extends PackageJobStoreContract {
    @Override
    Database open() { return ReviewDatabases.h2(); }
}
