package com.baysheet.web.review;

import com.baysheet.auth.User;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.MarkupNote;
import com.baysheet.review.SheetRevision;
import com.baysheet.review.SheetState;
import com.baysheet.store.review.Reviews;
import com.baysheet.store.review.StoredRevision;

import java.util.List;

/**
 * What the sheet page shows: the record the check is about (as submitted, or the current one while being
 * prepared), the markups grouped by what they target, and which actions to offer this user. The offer is
 * only a convenience: every action is checked again by the review rules when posted.
 */
record SheetPage(StoredRevision current, CalcRecord record, boolean inputsChanged, boolean changedSinceIssue,
                 boolean withdrawn, List<MarkupNote> markups, List<StoredRevision> history, Offer offer) {
    /**
     * The buttons shown to this user. {@code resolve}: a checker other than the preparer resolves a markup while the
     * check is open, also on a returned sheet, where a markup the preparer answered needs no change to the model.
     * {@code takeBack}: the preparer takes their submitted sheet back while no checker has acted on it (no markup).
     */
    record Offer(boolean submit, boolean resubmit, boolean check, boolean issue, boolean reply, boolean resolve, boolean takeBack) {}

    static SheetPage of(Reviews.SheetView v, CalcRecord currentRecord, User user) {
        StoredRevision cur = v.current();
        CalcRecord shown = cur.record().orElse(currentRecord);
        SheetRevision r = cur.revision();
        String now = CalcFingerprint.of(currentRecord);
        boolean changed = r.fingerprint() != null && !r.state().frozen() && !r.fingerprint().equals(now);
        // an issued revision stays in force until the next is issued: a change only flags it
        // a withdrawn issue no longer stands, changed or not: the next revision may be submitted
        boolean withdrawn = v.withdrawn() && r.state() == SheetState.ISSUED;
        boolean sinceIssue = r.outdatedBy(now) && !withdrawn;
        return new SheetPage(cur, shown, changed, sinceIssue, withdrawn, v.markups(), v.history(),
                offer(r, user, changed, sinceIssue || withdrawn, v.markups().isEmpty()));
    }

    private static Offer offer(SheetRevision r, User u, boolean changed, boolean sinceIssue, boolean noMarkups) {
        boolean preparer = r.preparer() != null && r.preparer().userId() == u.id();
        boolean otherChecker = u.role().mayCheck() && !preparer;
        SheetState s = r.state();
        return new Offer((s == SheetState.PREPARING || sinceIssue) && u.role().mayPrepare(),
                preparer && (s == SheetState.RETURNED || (changed && (s.awaitingCheck() || s == SheetState.APPROVED))),
                otherChecker && s.awaitingCheck(),
                otherChecker && s == SheetState.APPROVED,
                (preparer || u.role().mayCheck()) && (s.awaitingCheck() || s == SheetState.RETURNED),
                otherChecker && (s.awaitingCheck() || s == SheetState.RETURNED),
                preparer && s == SheetState.SUBMITTED && noMarkups);
    }

    /** The markups on one target code ("sheet", "input:KEY", "step:SYMBOL"). */
    public List<MarkupNote> on(String code) {
        return markups.stream().filter(m -> m.target().code().equals(code)).toList();
    }

    public long openCount() {
        return markups.stream().filter(m -> !m.resolved()).count();
    }
}
