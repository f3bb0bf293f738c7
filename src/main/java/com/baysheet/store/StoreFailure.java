package com.baysheet.store;

import java.sql.SQLException;

/** The database failed (not reachable, a constraint the forms should have caught): a fault of ours, not the user's. */
public final class StoreFailure extends RuntimeException {
    public StoreFailure(SQLException cause) {
        super("database: " + cause.getMessage(), cause);
    }
}
