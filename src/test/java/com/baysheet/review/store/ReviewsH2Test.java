package com.baysheet.review.store;

import com.baysheet.store.Database;

class ReviewsH2Test extends ReviewsContract {
    @Override
    Database open() { return ReviewDatabases.h2(); }
}
