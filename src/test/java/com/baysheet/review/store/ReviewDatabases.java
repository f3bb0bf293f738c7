package com.baysheet.review.store;

import com.baysheet.auth.Role;
import com.baysheet.auth.NewUser;
import com.baysheet.auth.User;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.store.Database;
import com.baysheet.project.ProjectInfo;
import com.baysheet.framing.Derivation;
import com.baysheet.store.Editor;
import com.baysheet.store.ModelWrites;
import com.baysheet.store.ProjectStore;
import com.baysheet.store.Sql;
import com.baysheet.store.auth.UserStore;
import org.junit.jupiter.api.Assumptions;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.UUID;

/**
 * Fresh databases with every migration applied, for the review and user stores: H2 in memory, or a new
 * schema on the PostgreSQL server named by BAYSHEET_TEST_PG_URL (which .ci/run exports).
 */
public final class ReviewDatabases {
    public static final String PG_ENV = "BAYSHEET_TEST_PG_URL";

    private ReviewDatabases() {}

    public static Database h2() {
        return Database.open("jdbc:h2:mem:r" + UUID.randomUUID().toString().replace("-", "")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;DB_CLOSE_DELAY=-1");
    }

    /** A fresh schema on the PostgreSQL test server; the test is skipped, saying why, when none is named. */
    public static Database postgres() {
        String server = System.getenv(PG_ENV);
        if (server == null || server.isBlank()) {
            String why = PG_ENV + " is not set: the PostgreSQL runs of the review store tests are skipped (.ci/run sets it)";
            System.out.println(why);
            Assumptions.abort(why);
        }
        String schema = "r" + UUID.randomUUID().toString().replace("-", "").substring(0, 16);
        try (Connection c = DriverManager.getConnection(server); Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot create a test schema on " + server, e);
        }
        return Database.open(server + (server.contains("?") ? "&" : "?") + "currentSchema=" + schema);
    }

    public static long project(Database db, String jobNumber) {
        return new ProjectStore(new ModelWrites(new Sql(db.dataSource()), Derivation::derive)).create(Editor.DEMO, new ProjectInfo(jobNumber, "Test job " + jobNumber, "",
                "", "ASCE 7-16", UnitSystem.US, false, false)).id();
    }

    public static User user(Database db, String username, String initials, Role role) {
        return new UserStore(new Sql(db.dataSource())).create(new NewUser(username, "Name of " + username, initials, role),
                "$2a$04$notarealhashnotarealhashnotarealhashnotarealhashnotre");
    }
}
