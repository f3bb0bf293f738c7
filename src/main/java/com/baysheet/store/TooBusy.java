package com.baysheet.store;

/**
 * A request the server will not queue now because a limit of shared work is reached (the package queue):
 * answered 429 with the limit named and a Retry-After, so the user can try again shortly.
 */
public final class TooBusy extends RuntimeException {
    private final String limit;
    private final int retryAfterSeconds;

    public TooBusy(String limit, String message, int retryAfterSeconds) {
        super(message);
        this.limit = limit;
        this.retryAfterSeconds = retryAfterSeconds;
    }

    public String limit() { return limit; }

    public int retryAfterSeconds() { return retryAfterSeconds; }
}
