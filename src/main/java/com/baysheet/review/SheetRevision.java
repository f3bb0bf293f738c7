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
 * superseded. Each step returns a new value or throws a {@link ReviewRefused} saying why not. As on drawings,
 * an issued revision stays current until the next one is issued: a change to the calculation makes it "changed
 * since issue" ({@link #outdatedBy}), the next revision opens when it is submitted ({@link #reopen}), and the
 * store marks the earlier one superseded when the next is issued.
 *
 * @param number      1 for the first revision (which a mark sheet prints as revision 0)
 * @param preparer    null until first submitted
 * @param fingerprint the member's calculation as submitted ({@link CalcFingerprint}; stored as inputs_sha256); null until submitted
 * @param approval    null until approved
 * @param issue       null until issued
 */
public record SheetRevision(int number, SheetState state, Preparer preparer, String fingerprint,
                            Approval approval, Issue issue) {
    public record Preparer(long userId, String initials, LocalDate on) {}

    public record Approval(long checkerId, String initials, LocalDate on) {}

    /** @param description what the revision changed, as the revision block prints it; null on revisions issued before it was asked */
    public record Issue(long issuerId, LocalDate on, String pdfSha256, String description) {}

    /** The longest description a revision block prints. */
    public static final int MAX_DESCRIPTION = 200;

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

    /**
     * Takes a submitted sheet back to being prepared, by its preparer, before any checker has acted on it: no markup
     * on it yet. A resubmitted sheet was acted on already (returned with markups), so it stays with its checker.
     */
    public SheetRevision takeBack(Actor a, int markups) {
        mayPrepare(ReviewAction.TAKE_BACK, a);
        if (state != SUBMITTED)
            throw new WrongState(ReviewAction.TAKE_BACK, state, "only a sheet submitted for check, before any checker has acted on it, is taken back");
        if (!isPreparer(a))
            throw new NotPermitted(ReviewAction.TAKE_BACK, "only its preparer (" + preparer.initials() + ") takes a submitted sheet back");
        if (markups > 0)
            throw new Markups(ReviewAction.TAKE_BACK, "a checker has begun: " + markups
                    + " markup(s) are on it; ask the checker to return it instead");
        return opened(number);
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
    public SheetRevision issue(Actor a, LocalDate on, String pdfSha256, String currentInputs, String description) {
        String said = description(description);
        mayIssue(a);
        if (state != APPROVED) throw new WrongState(ReviewAction.ISSUE, state, "only an approved sheet is issued");
        if (!fingerprint.equals(currentInputs)) throw new InputsChanged(ReviewAction.ISSUE);
        if (pdfSha256 == null || !pdfSha256.matches("[0-9a-f]{64}"))
            throw new IllegalArgumentException("pdfSha256: 64 lower-case hex digits (got " + pdfSha256 + ")");
        if (on.isBefore(approval.on())) throw new IllegalArgumentException("on: issue " + on + " before approval " + approval.on());
        return new SheetRevision(number, ISSUED, preparer, fingerprint, approval, new Issue(a.userId(), on, pdfSha256, said));
    }

    /** A revision's description as typed: required, one line, at most {@link #MAX_DESCRIPTION} characters. */
    public static String description(String text) {
        String t = text == null ? "" : text.strip().replaceAll("\\s+", " ");
        if (t.isEmpty()) throw new com.baysheet.engine.InputError("description", "\"\"", "say what this revision changes (the revision block prints it)");
        if (t.length() > MAX_DESCRIPTION)
            throw new com.baysheet.engine.InputError("description", t.length() + " characters", "at most " + MAX_DESCRIPTION + " characters");
        return t;
    }

    /** Whether this issued revision is changed since issue: the sheet's calculation now differs from the one issued. */
    public boolean outdatedBy(String currentInputs) {
        return state == ISSUED && !fingerprint.equals(currentInputs);
    }

    /**
     * The next revision, opened on an issued one whose calculation changed since issue; the issued one stays in
     * force until this one is issued.
     */
    public SheetRevision reopen(String currentInputs) {
        if (state != ISSUED) throw new WrongState(ReviewAction.SUBMIT, state, "a new revision opens on an issued sheet");
        if (!outdatedBy(currentInputs))
            throw new WrongState(ReviewAction.SUBMIT, state, "its calculation is unchanged since issue, so the issued sheet still stands");
        return opened(number + 1);
    }

    /** This issued revision once the next one is issued (the store writes the same in the issuing transaction). */
    public SheetRevision supersededByNext() {
        if (state != ISSUED) throw new WrongState(ReviewAction.SUPERSEDE, state, "only an issued sheet is superseded, by the next issue");
        return new SheetRevision(number, SUPERSEDED, preparer, fingerprint, approval, issue);
    }

    /**
     * Who may issue this revision: a checker, never its preparer (the four-eyes rule holds to the end, so that
     * nobody sends out their own work alone). The issuing service asks before it renders the issued copy.
     */
    public void mayIssue(Actor a) {
        if (!a.role().mayCheck()) throw new NotPermitted(ReviewAction.ISSUE, "a checker issues approved sheets");
        if (isPreparer(a)) throw new FourEyes(ReviewAction.ISSUE);
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
