package com.baysheet.review.store;

import com.baysheet.store.Database;

class AddedPersonH2Test extends AddedPersonContract {
    @Override
    Database open() { return ReviewDatabases.h2(); }
}
