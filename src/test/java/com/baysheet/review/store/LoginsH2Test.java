package com.baysheet.review.store;

import com.baysheet.store.Database;

class LoginsH2Test extends LoginsContract {
    @Override
    Database open() { return ReviewDatabases.h2(); }
}
