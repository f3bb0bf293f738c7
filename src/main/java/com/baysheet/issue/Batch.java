package com.baysheet.issue;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Submittal;
import com.baysheet.review.Caller;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.ReviewRefused;
import com.baysheet.review.SheetRevision;
import com.baysheet.store.Results;
import com.baysheet.store.review.ConcurrentChange;
import com.baysheet.store.review.ReviewStore;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * One action applied to several mark sheets, sheet by sheet, through exactly the calls the single actions make:
 * each sheet in its own transaction with its own audit entry, checked by the same review rules (the four-eyes rule,
 * the sheet's state, its version as the page showed it). A sheet the rules refuse is reported with their reason and
 * left as it was; the others go ahead. Nothing is half-done for any one sheet.
 */
public final class Batch {
    /** The most sheets one batch takes: a whole level of the largest model the benchmarks use, and more. */
    public static final int MAX_SHEETS = 500;

    public enum Kind {
        SUBMIT("submitted for check"), APPROVE("approved"), ISSUE("issued");

        private final String done;

        Kind(String done) { this.done = done; }

        /** What a sheet the action went through now is. */
        public String done() { return done; }
    }

    /** A ticked sheet: its mark's stored id and the sheet version the page showed. */
    public record Pick(long markId, long version) {}

    /**
     * What became of one ticked sheet: done, or refused with the reason in the user's words; {@code refusal} is the
     * rules' refusal, when it was theirs (the web records those refused for the person's rights).
     */
    public record Outcome(String sheet, long markId, boolean done, String reason, ReviewRefused refusal) {
        public Optional<ReviewRefused> rulesRefusal() { return Optional.ofNullable(refusal); }
    }

    private final ReviewStore review;
    private final Issuing issuing;

    public Batch(ReviewStore review, Issuing issuing) {
        this.review = review;
        this.issuing = issuing;
    }

    /** At least one sheet and at most {@link #MAX_SHEETS}; otherwise an input error naming the field and the limit. */
    public static void cap(String field, int sheets) {
        if (sheets < 1) throw new InputError(field, "none", "tick at least one sheet");
        if (sheets > MAX_SHEETS)
            throw new InputError(field, sheets + " sheets", "at most " + MAX_SHEETS + " sheets in one batch (limit " + field + ")");
    }

    /**
     * Applies the action to each pick in turn. An issue takes one description for all ({@code description}, checked
     * before any sheet is touched) and prints the project's submittal data ({@code site}, may be null).
     */
    public List<Outcome> run(Kind kind, Results.Computed c, MarkSheets marks, List<Pick> picks, Caller who,
                             String description, Submittal site) {
        cap("sheet", picks.size());
        if (kind == Kind.ISSUE) SheetRevision.description(description);
        List<Outcome> out = new ArrayList<>(picks.size());
        for (Pick p : picks) out.add(one(kind, c, marks, p, who, description, site));
        return out;
    }

    private Outcome one(Kind kind, Results.Computed c, MarkSheets marks, Pick p, Caller who, String description, Submittal site) {
        Optional<MarkSheets.MarkSheet> found = marks.byId(p.markId());
        if (found.isEmpty()) return new Outcome("(a mark no longer in use)", p.markId(), false, "no member carries this mark now; reload the queue", null);
        SheetSubject.OfMark s = new SheetSubject.OfMark(c, marks, found.get(), found.get().ref(c.project().id()));
        try {
            switch (kind) {
                case SUBMIT -> review.reviews().submit(s.ref(), p.version(), who, issuing.today(), s.current());
                case APPROVE -> review.reviews().approve(s.ref(), p.version(), who, issuing.today(), s.current());
                case ISSUE -> issuing.issue(s, p.version(), who, description, site);
            }
            return new Outcome(s.name(), p.markId(), true, kind.done(), null);
        } catch (ReviewRefused e) {
            return new Outcome(s.name(), p.markId(), false, e.getMessage(), e);
        } catch (ConcurrentChange e) {
            return new Outcome(s.name(), p.markId(), false, "changed by someone else since the queue was shown; reload it and try again", null);
        } catch (InputError e) {
            return new Outcome(s.name(), p.markId(), false, e.getMessage(), null);
        }
    }
}
