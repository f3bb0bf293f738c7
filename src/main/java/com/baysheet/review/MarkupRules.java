package com.baysheet.review;

import com.baysheet.review.ReviewRefused.Markups;
import com.baysheet.review.ReviewRefused.NotPermitted;
import com.baysheet.review.ReviewRefused.WrongState;

import static com.baysheet.review.SheetState.RETURNED;

/**
 * Who may mark up a revision and when. A checker other than the preparer adds markups while the sheet
 * awaits its check; the preparer and checkers reply while the check is open; only a checker other than
 * the preparer resolves or reopens one. Approved and issued sheets take no more markups or replies.
 */
public final class MarkupRules {
    private MarkupRules() {}

    public static void add(SheetRevision r, Actor a) {
        r.checker(ReviewAction.MARKUP, a);
        if (!r.state().awaitingCheck())
            throw new WrongState(ReviewAction.MARKUP, r.state(), "markups are added while a sheet awaits its check");
    }

    public static void reply(SheetRevision r, Actor a) {
        checkOpen(ReviewAction.REPLY, r);
        if (!r.isPreparer(a) && !a.role().mayCheck())
            throw new NotPermitted(ReviewAction.REPLY, "the preparer and checkers reply to markups");
    }

    public static void resolve(SheetRevision r, Actor a, MarkupNote m) {
        r.checker(ReviewAction.RESOLVE, a);
        checkOpen(ReviewAction.RESOLVE, r);
        if (m.resolved()) throw new Markups(ReviewAction.RESOLVE, "this markup is already resolved");
    }

    public static void reopen(SheetRevision r, Actor a, MarkupNote m) {
        r.checker(ReviewAction.REOPEN, a);
        checkOpen(ReviewAction.REOPEN, r);
        if (!m.resolved()) throw new Markups(ReviewAction.REOPEN, "this markup is still open");
    }

    private static void checkOpen(ReviewAction action, SheetRevision r) {
        if (!r.state().awaitingCheck() && r.state() != RETURNED)
            throw new WrongState(action, r.state(), "markups are answered while the check is open");
    }
}
