package com.baysheet.review.store;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.auth.User;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.Sketch;
import com.baysheet.engine.record.Step;
import com.baysheet.review.Caller;
import com.baysheet.review.MarkupNote;
import com.baysheet.review.ReviewRefused;
import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetState;
import com.baysheet.store.Database;
import com.baysheet.store.Sql;
import com.baysheet.store.review.ConcurrentChange;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.store.review.Reviews;
import com.baysheet.store.review.StoredRevision;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The sheet check over the real migrations; run on H2 and on PostgreSQL. */
abstract class ReviewsContract {
    static final LocalDate DAY = LocalDate.of(2026, 3, 2);
    static final byte[] PDF = "%PDF-1.4 issued copy".getBytes();

    Database db;
    ReviewStore store;
    SheetRef ref;
    Caller engineer;
    Caller checker;
    Caller secondChecker;

    abstract Database open();

    @BeforeEach
    void setUp() {
        db = open();
        store = ReviewStore.on(new Sql(db.dataSource()));
        ref = new SheetRef(ReviewDatabases.project(db, "J-1"), "L2-B-3");
        engineer = caller(ReviewDatabases.user(db, "eve", "EP", Role.ENGINEER));
        checker = caller(ReviewDatabases.user(db, "carl", "CK", Role.CHECKER));
        secondChecker = caller(ReviewDatabases.user(db, "cora", "CO", Role.CHECKER));
    }

    @AfterEach
    void tearDown() {
        if (db != null) db.close();
    }

    static Caller caller(User u) { return Caller.of(u, "127.0.0.1"); }

    static CalcRecord record(double span) {
        return new CalcRecord("B-3", "ASCE 7-16", "US", List.of(new Entry("span", "Span", span, "ft", String.valueOf(span), "ft")),
                List.of(new Step("K_LL", "Live load element factor", "Table 4.7-1", "2", 2, "", "2", "",
                        new Clause("ASCE 7-16", "Table 4.7-1", "seen"))),
                List.of(new Entry("M", "Moment", span * 2000, "lb·ft", String.valueOf(span * 2), "kip·ft")), List.of("M"), List.of(), Sketch.NONE);
    }

    Reviews reviews() { return store.reviews(); }

    long version() { return reviews().view(ref).current().version(); }

    StoredRevision current() { return reviews().view(ref).current(); }

    /** Prepared, marked up, returned, answered, resubmitted, resolved, approved and issued. */
    void throughIssue(CalcRecord r) {
        reviews().submit(ref, 0, engineer, DAY, r);
        long m = store.markups().add(ref, checker, "step:K_LL", "Confirm K_LL for an edge beam");
        reviews().returnWithMarkups(ref, version(), checker);
        store.markups().reply(ref, m, engineer, "Interior beam: 2 is right");
        reviews().resubmit(ref, version(), engineer, DAY, r);
        store.markups().resolve(ref, m, 1, checker, true);
        reviews().approve(ref, version(), checker, DAY, r);
        reviews().issue(ref, version(), checker, DAY, r, PDF, "First issue");
    }

    @Test
    void aSheetGoesFromSubmittedToIssuedWithItsPdfFrozen() {
        throughIssue(record(20));
        Reviews.SheetView v = reviews().view(ref);
        assertThat(v.current().revision().state()).isEqualTo(SheetState.ISSUED);
        assertThat(v.current().revision().approval().initials()).isEqualTo("CK");
        assertThat(v.current().revision().issue().pdfSha256()).isEqualTo(Tokens.sha256(PDF));
        assertThat(reviews().issuedPdf(v.current().id())).contains(PDF);
        assertThat(reviews().withPdf(Tokens.sha256(PDF))).extracting(StoredRevision::id).containsExactly(v.current().id());
        MarkupNote m = v.markups().get(0);
        assertThat(m.resolved()).isTrue();
        assertThat(m.replies()).extracting(MarkupNote.Reply::text).containsExactly("Interior beam: 2 is right");
        assertThat(v.current().record()).contains(record(20));
        // the project's own "edit" entry (its creation) is not part of the sheet's story
        assertThat(store.audit().all()).extracting(e -> e.action()).filteredOn(a -> !a.equals("edit"))
                .containsExactly("submit", "markup", "return", "reply", "resubmit", "resolve", "approve", "issue");
    }

    @Test
    void anIssuedRevisionStaysCurrentUntilTheNextIsIssued() {
        throughIssue(record(20));
        StoredRevision first = current();
        assertThatThrownBy(() -> reviews().submit(ref, first.version(), engineer, DAY, record(20)))
                .as("unchanged since issue: nothing to revise").isInstanceOf(ReviewRefused.class);
        // the calculation changes: submitting opens revision 2 while revision 1 stays issued
        reviews().submit(ref, first.version(), engineer, DAY, record(24));
        List<StoredRevision> h = reviews().view(ref).history();
        assertThat(h).extracting(s -> s.revision().number()).containsExactly(1, 2);
        assertThat(h.get(0).revision().state()).as("changed since issue, not superseded").isEqualTo(SheetState.ISSUED);
        assertThat(h.get(1).revision().state()).isEqualTo(SheetState.SUBMITTED);
        reviews().approve(ref, version(), checker, DAY, record(24));
        byte[] second = "%PDF-1.4 second".getBytes();
        reviews().issue(ref, version(), checker, DAY, record(24), second, "Floor dead load raised");
        h = reviews().view(ref).history();
        assertThat(h.get(0).revision().state()).as("superseded once the next is issued").isEqualTo(SheetState.SUPERSEDED);
        assertThat(h.get(1).revision().state()).isEqualTo(SheetState.ISSUED);
        assertThat(h.get(1).revision().issue().description()).isEqualTo("Floor dead load raised");
        assertThat(reviews().issuedPdf(h.get(0).id())).as("the superseded copy stays downloadable").contains(PDF);
    }

    @Test
    void theNextRevisionTakenBackLeavesTheIssuedOneInForceAndIsSubmittedAgain() {
        throughIssue(record(20));
        reviews().submit(ref, current().version(), engineer, DAY, record(24));
        assertThatThrownBy(() -> reviews().takeBack(ref, version(), checker)).isInstanceOf(ReviewRefused.NotPermitted.class);
        reviews().takeBack(ref, version(), engineer);
        List<StoredRevision> h = reviews().view(ref).history();
        assertThat(h).extracting(s -> s.revision().number()).containsExactly(1, 2);
        assertThat(h.get(0).revision().state()).as("the issued revision stays in force").isEqualTo(SheetState.ISSUED);
        assertThat(h.get(1).revision().state()).isEqualTo(SheetState.PREPARING);
        assertThat(h.get(1).revision().preparer()).isNull();
        assertThat(h.get(1).record()).as("the calculation as submitted goes with the submission").isEmpty();
        assertThat(store.audit().all()).filteredOn(e -> e.action().equals("take back")).hasSize(1)
                .allMatch(e -> e.actorUsername().equals("eve") && e.detail().equals("revision 2 now being prepared"));

        reviews().submit(ref, version(), engineer, DAY, record(24));
        h = reviews().view(ref).history();
        assertThat(h).extracting(s -> s.revision().number()).as("submitted again as the same revision").containsExactly(1, 2);
        assertThat(h.get(1).revision().state()).isEqualTo(SheetState.SUBMITTED);
        assertThat(h.get(1).record()).contains(record(24));
    }

    @Test
    void issuedWorkRefusesEveryChangeAndStaysAsItWas() {
        throughIssue(record(20));
        StoredRevision before = current();
        long v = before.version();
        assertThatThrownBy(() -> reviews().resubmit(ref, v, engineer, DAY, record(24))).isInstanceOf(ReviewRefused.class);
        assertThatThrownBy(() -> reviews().approve(ref, v, secondChecker, DAY, record(20))).isInstanceOf(ReviewRefused.class);
        assertThatThrownBy(() -> reviews().issue(ref, v, checker, DAY, record(20), "other".getBytes(), "Reissued")).isInstanceOf(ReviewRefused.class);
        assertThatThrownBy(() -> store.markups().add(ref, secondChecker, "sheet", "late note")).isInstanceOf(ReviewRefused.class);
        assertThat(current()).isEqualTo(before);
        assertThat(reviews().issuedPdf(before.id())).contains(PDF);
    }

    @Test
    void thePreparerCannotApproveTheirOwnSheetInTheStoreEither() {
        reviews().submit(ref, 0, checker, DAY, record(20));
        assertThatThrownBy(() -> reviews().approve(ref, version(), checker, DAY, record(20)))
                .isInstanceOf(ReviewRefused.FourEyes.class);
        assertThat(current().revision().state()).isEqualTo(SheetState.SUBMITTED);
        assertThat(store.audit().all()).extracting(e -> e.action()).filteredOn(a -> !a.equals("edit")).containsExactly("submit");
    }

    @Test
    void aPageOpenedAtAnOlderVersionIsAConflict() {
        reviews().submit(ref, 0, engineer, DAY, record(20));
        long seen = version();
        store.markups().add(ref, checker, "sheet", "Where is the deflection check?");
        assertThatThrownBy(() -> reviews().approve(ref, seen, secondChecker, DAY, record(20)))
                .isInstanceOf(ConcurrentChange.class).hasMessageContaining("reload");
        assertThatThrownBy(() -> reviews().submit(ref, 0, engineer, DAY, record(20))).isInstanceOf(ConcurrentChange.class);
    }

    @Test
    void twoCheckersApprovingAtOnceOneWinsTheOtherGetsAConflict() throws Exception {
        reviews().submit(ref, 0, engineer, DAY, record(20));
        long v = version();
        Object[] outcome = new Object[2];
        Thread a = new Thread(() -> outcome[0] = attempt(() -> reviews().approve(ref, v, checker, DAY, record(20))));
        Thread b = new Thread(() -> outcome[1] = attempt(() -> reviews().approve(ref, v, secondChecker, DAY, record(20))));
        a.start();
        b.start();
        a.join();
        b.join();
        assertThat(outcome).filteredOn("ok"::equals).hasSize(1);
        assertThat(outcome).filteredOn(o -> o instanceof ConcurrentChange).hasSize(1);
        assertThat(current().revision().state()).isEqualTo(SheetState.APPROVED);
        assertThat(store.audit().all()).filteredOn(e -> e.action().equals("approve")).hasSize(1);
    }

    @Test
    void textWithSqlOrScriptIsStoredAsTyped() {
        reviews().submit(ref, 0, engineer, DAY, record(20));
        String text = "'); DELETE FROM sheet_revision; -- <script>alert(1)</script>";
        store.markups().add(ref, checker, "sheet", text);
        assertThat(reviews().view(ref).markups()).extracting(MarkupNote::text).containsExactly(text);
        assertThat(current().revision().state()).isEqualTo(SheetState.SUBMITTED);
    }

    private static Object attempt(Runnable r) {
        try {
            r.run();
            return "ok";
        } catch (RuntimeException e) {
            return e;
        }
    }
}
