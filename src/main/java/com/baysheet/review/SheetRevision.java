package com.baysheet.review;

import com.baysheet.review.ReviewRefused.FourEyes;
import com.baysheet.review.ReviewRefused.InputsChanged;
import com.baysheet.review.ReviewRefused.Markups;
import com.baysheet.review.ReviewRefused.NotPermitted;
import com.baysheet.review.ReviewRefused.WrongState;

import java.time.LocalDate;

import static com.baysheet.review.SheetState.*;

/**
 * One revision of a member's calculation sheet and the rules that move it along:
 * being prepared → submitted for check → (returned with markups → resubmitted)* → approved → issued →
 * superseded. Each step returns a new value or throws a {@link ReviewRefused} saying why not.
 *
 * @param number      1 for the first revision; the next opens when an issued one is superseded
 * @param preparer    null until first submitted
 * @param fingerprint the member's calculation as submitted ({@link CalcFingerprint}; stored as inputs_sha256); null until submitted
 * @param approval    null until approved
 * @param issue       null until issued
 */
public record SheetRevision(int number, SheetState state, Preparer preparer, String fingerprint,
                            Approval approval, Issue issue) {
    public record Preparer(long userId, String initials, LocalDate on) {}

    public record Approval(long checkerId, String initials, LocalDate on) {}

    public record Issue(long issuerId, LocalDate on, String pdfSha256) {}

    public SheetRevision {
        if (number < 1) throw new IllegalArgumentException("number: revisions count from 1 (got " + number + ")");
        if (state == null) throw new IllegalArgumentException("state: required");
    }

    /** A new revision being prepared. */
    public static SheetRevision opened(int number) {
        return new SheetRevision(number, PREPARING, null, null, null, null);
    }

    public SheetRevision submit(Actor a, String inputs, LocalDate on) {
        mayPrepare(ReviewAction.SUBMIT, a);
        if (state != PREPARING) throw new WrongState(ReviewAction.SUBMIT, state, "only a sheet being prepared is submitted");
        return new SheetRevision(number, SUBMITTED, new Preparer(a.userId(), a.initials(), on), inputs, null, null);
    }

    /**
     * Sends a returned sheet back to the checker; also withdraws a submitted or approved sheet whose inputs
     * changed since, so that its check is done again on the current calculation (an approval is void).
     */
    public SheetRevision resubmit(Actor a, String inputs, LocalDate on) {
        mayPrepare(ReviewAction.RESUBMIT, a);
        if (frozenOrPreparing() || (state != RETURNED && inputs.equals(fingerprint)))
            throw new WrongState(ReviewAction.RESUBMIT, state,
                    "resubmit a sheet that was returned with markups, or one whose inputs changed since it was submitted");
        if (preparer.userId() != a.userId())
            throw new NotPermitted(ReviewAction.RESUBMIT, "only its preparer (" + preparer.initials() + ") resubmits a sheet");
        return new SheetRevision(number, RESUBMITTED, new Preparer(a.userId(), a.initials(), on), inputs, null, null);
    }

    public SheetRevision returnWithMarkups(Actor a, int openMarkups) {
        checker(ReviewAction.RETURN, a);
        if (!state.awaitingCheck()) throw new WrongState(ReviewAction.RETURN, state, "only a sheet awaiting its check is returned");
        if (openMarkups < 1) throw new Markups(ReviewAction.RETURN, "add at least one markup saying what to change");
        return new SheetRevision(number, RETURNED, preparer, fingerprint, null, null);
    }

    public SheetRevision approve(Actor a, LocalDate on, int openMarkups, String currentInputs) {
        checker(ReviewAction.APPROVE, a);
        if (!state.awaitingCheck()) throw new WrongState(ReviewAction.APPROVE, state, "only a sheet awaiting its check is approved");
        if (openMarkups > 0) throw new Markups(ReviewAction.APPROVE, openMarkups + " markup(s) are still open; resolve them first");
        if (!fingerprint.equals(currentInputs)) throw new InputsChanged(ReviewAction.APPROVE);
        if (on.isBefore(preparer.on())) throw new IllegalArgumentException("on: approval " + on + " before preparation " + preparer.on());
        return new SheetRevision(number, APPROVED, preparer, fingerprint, new Approval(a.userId(), a.initials(), on), null);
    }

    /** Freezes the approved sheet: from here on its PDF, whose SHA-256 is given, is the issued copy. */
    public SheetRevision issue(Actor a, LocalDate on, String pdfSha256, String currentInputs) {
        if (!a.role().mayCheck()) throw new NotPermitted(ReviewAction.ISSUE, "a checker issues approved sheets");
        if (state != APPROVED) throw new WrongState(ReviewAction.ISSUE, state, "only an approved sheet is issued");
        if (!fingerprint.equals(currentInputs)) throw new InputsChanged(ReviewAction.ISSUE);
        if (pdfSha256 == null || !pdfSha256.matches("[0-9a-f]{64}"))
            throw new IllegalArgumentException("pdfSha256: 64 lower-case hex digits (got " + pdfSha256 + ")");
        if (on.isBefore(approval.on())) throw new IllegalArgumentException("on: issue " + on + " before approval " + approval.on());
        return new SheetRevision(number, ISSUED, preparer, fingerprint, approval, new Issue(a.userId(), on, pdfSha256));
    }

    /** Whether the member's current inputs differ from those this issued revision was issued with. */
    public boolean outdatedBy(String currentInputs) {
        return state == ISSUED && !fingerprint.equals(currentInputs);
    }

    /** Marks an issued revision superseded by a change of the member's inputs. */
    public SheetRevision supersede(String currentInputs) {
        if (state != ISSUED) throw new WrongState(ReviewAction.SUPERSEDE, state, "only an issued sheet is superseded");
        if (!outdatedBy(currentInputs))
            throw new WrongState(ReviewAction.SUPERSEDE, state, "its inputs are unchanged, so the issued sheet still stands");
        return new SheetRevision(number, SUPERSEDED, preparer, fingerprint, approval, issue);
    }

    /** The revision that follows a superseded one. */
    public SheetRevision next() {
        if (state != SUPERSEDED) throw new WrongState(ReviewAction.SUPERSEDE, state, "a new revision follows a superseded one");
        return opened(number + 1);
    }

    /** The rules shared by everything a checker does: the role, and the four-eyes rule. */
    void checker(ReviewAction action, Actor a) {
        if (!a.role().mayCheck()) throw new NotPermitted(action, "only a checker may do this");
        if (preparer != null && preparer.userId() == a.userId()) throw new FourEyes(action);
    }

    boolean isPreparer(Actor a) {
        return preparer != null && preparer.userId() == a.userId();
    }

    private boolean frozenOrPreparing() {
        return state.frozen() || state == PREPARING;
    }

    private static void mayPrepare(ReviewAction action, Actor a) {
        if (!a.role().mayPrepare()) throw new NotPermitted(action, "an " + a.role().label() + " does not prepare sheets");
    }
}
