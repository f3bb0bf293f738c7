package com.baysheet.store.review;

/**
 * Someone else changed the sheet since this page was opened (two checkers approving at once, say): the
 * later action is refused rather than applied over the other.
 */
public final class ConcurrentChange extends RuntimeException {
    public ConcurrentChange(String what) {
        super(what + " was changed by someone else since you opened it; reload the page to see the change, then try again");
    }
}
