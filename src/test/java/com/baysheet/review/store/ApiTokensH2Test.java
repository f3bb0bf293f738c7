package com.baysheet.review.store;

import com.baysheet.store.Database;

class ApiTokensH2Test extends ApiTokensContract {
    @Override
    Database open() { return ReviewDatabases.h2(); }
}
