package com.baysheet.store;

import com.baysheet.auth.NewUser;
import com.baysheet.auth.Role;
import com.baysheet.auth.User;
import com.baysheet.framing.Derivation;
import com.baysheet.issue.Issuing;
import com.baysheet.issue.SheetSubject;
import com.baysheet.review.Caller;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.SheetRef;
import com.baysheet.store.auth.UserStore;
import com.baysheet.store.review.ReviewStore;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.Clock;
import java.time.LocalDate;

/**
 * An office as a server leaves it in its H2 data directory: the demo projects, an engineer and a checker, and mark sheets
 * taken through the check (submitted, marked up, answered, resolved, approved) and issued through the real issuing
 * path, so their PDFs are rendered and hashed as in production.
 */
final class TransferOffice {
    static final String HASH = "$2a$04$notarealhashnotarealhashnotarealhashnotarealhashnotre";

    final Store store;
    final ReviewStore review;
    final Issuing issuing;
    final Caller engineer, checker;

    private TransferOffice(Database db, User engineer, User checker) {
        Clock clock = Clock.systemUTC();
        this.store = Store.on(db.dataSource(), Derivation::derive, clock);
        this.review = ReviewStore.on(new Sql(db.dataSource(), clock));
        this.issuing = new Issuing(review, clock, com.baysheet.TestKeys.signer());
        this.engineer = Caller.of(engineer, "127.0.0.1");
        this.checker = Caller.of(checker, "127.0.0.1");
    }

    /** The office's stores over a database that holds its users already (the target after a transfer). */
    static TransferOffice over(Database db, User engineer, User checker) {
        return new TransferOffice(db, engineer, checker);
    }

    /** Fills a new data directory; returns the two users it made. */
    static User[] load(Path dir) throws Exception {
        Database.prepareDataDir(dir);
        try (Database db = Database.open(Database.h2Url(dir))) {
            UserStore users = new UserStore(new Sql(db.dataSource()));
            User eng = users.create(new NewUser("erin", "Erin Engineer", "EE", Role.ENGINEER), HASH);
            User chk = users.create(new NewUser("chris", "Chris Checker", "CC", Role.CHECKER), HASH);
            TransferOffice o = new TransferOffice(db, eng, chk);
            if (Demo.loadIfEmpty(o.store).isEmpty()) throw new IllegalStateException("the demo did not load");
            long project = o.store.projects().findAll().get(0).id();
            o.issue(project, 0, true);
            o.issue(project, 1, false);
            o.issue(project, 2, true);
            oddDoubles(db);
            return new User[] {eng, chk};
        }
    }

    /** Takes the n-th mark sheet of the project through the check and issues it; with a markup answered and resolved. */
    void issue(long project, int n, boolean markedUp) {
        SheetSubject.OfMark s = subject(project, n);
        SheetRef ref = s.ref();
        LocalDate today = issuing.today();
        review.reviews().submit(ref, version(ref), engineer, today, s.current());
        if (markedUp) {
            long m = review.markups().add(ref, checker, "sheet", "Confirm the tributary width at the edge bay");
            review.markups().reply(ref, m, engineer, "Half the bay plus the overhang, as shown");
            review.markups().resolve(ref, m, 1, checker, true);
        }
        review.reviews().approve(ref, version(ref), checker, today, s.current());
        issuing.issue(s, version(ref), checker, "First issue", null);
    }

    SheetSubject.OfMark subject(long project, int n) {
        Results.Computed c = store.results().of(project);
        MarkSheets marks = store.marks().of(project, c.derived());
        return SheetSubject.mark(c, marks, String.valueOf(marks.all().get(n).mark().id()));
    }

    private long version(SheetRef ref) {
        return review.reviews().view(ref).current().version();
    }

    /** Doubles that a lossy copy would change: NaN, the next double after 0.3, the smallest subnormal. */
    private static void oddDoubles(Database db) throws SQLException {
        try (Connection c = db.dataSource().getConnection(); PreparedStatement ps = c.prepareStatement(
                "UPDATE building_level SET eave_to_ridge = ? WHERE id = (SELECT MAX(id) - ? FROM building_level)")) {
            double[] odd = {Double.NaN, 0.1 + 0.2, Double.MIN_VALUE};
            for (int i = 0; i < odd.length; i++) {
                ps.setDouble(1, odd[i]);
                ps.setInt(2, i);
                ps.executeUpdate();
            }
        }
    }
}
