package com.baysheet.review;

/**
 * A review step the rules refuse. Each subclass is one reason; the message says what was refused and
 * what would make it possible, in words a user can act on.
 */
public abstract class ReviewRefused extends RuntimeException {
    private final ReviewAction action;

    protected ReviewRefused(ReviewAction action, String message) {
        super("Cannot " + action.label() + ": " + message);
        this.action = action;
    }

    public ReviewAction action() { return action; }

    /** The user's role does not allow the action at all. */
    public static final class NotPermitted extends ReviewRefused {
        public NotPermitted(ReviewAction action, String why) { super(action, why); }
    }

    /** The four-eyes rule: the preparer may not check or approve their own sheet. */
    public static final class FourEyes extends ReviewRefused {
        public FourEyes(ReviewAction action) {
            super(action, action == ReviewAction.ISSUE
                    ? "you prepared this sheet, and a sheet is issued by someone other than its preparer"
                    : "you prepared this sheet, and a sheet must be checked by someone other than its preparer");
        }
    }

    /** The action is not one the revision's state allows. */
    public static final class WrongState extends ReviewRefused {
        private final SheetState state;

        public WrongState(ReviewAction action, SheetState state, String what) {
            super(action, "the sheet is " + state.label() + "; " + what);
            this.state = state;
        }

        public SheetState state() { return state; }
    }

    /** Approval waits until every markup is resolved; returning needs at least one open markup. */
    public static final class Markups extends ReviewRefused {
        public Markups(ReviewAction action, String why) { super(action, why); }
    }

    /** The member's inputs changed since the sheet was submitted: the check would not be of this calculation. */
    public static final class InputsChanged extends ReviewRefused {
        public InputsChanged(ReviewAction action) {
            super(action, "the member's inputs changed since the sheet was submitted; "
                    + "the preparer must resubmit it so that the check covers the current calculation");
        }
    }
}
