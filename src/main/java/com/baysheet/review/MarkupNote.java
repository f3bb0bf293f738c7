package com.baysheet.review;

import com.baysheet.engine.InputError;

import java.util.List;

/**
 * A checker's markup on one revision, open or resolved, with the replies that followed it.
 * {@code version} guards against two people resolving or replying over each other.
 */
public record MarkupNote(long id, MarkupTarget target, long authorId, String authorInitials, String text,
                         boolean resolved, List<Reply> replies, long version) {
    public static final int MAX_TEXT = 4000;

    public record Reply(long authorId, String authorInitials, String text) {}

    public MarkupNote {
        if (target == null) throw new IllegalArgumentException("target: required");
        replies = List.copyOf(replies);
    }

    /** A markup's or reply's text as typed: required, at most {@link #MAX_TEXT} characters. */
    public static String text(String field, String typed) {
        if (typed == null || typed.isBlank()) throw new InputError(field, "\"\"", "write what should be checked or changed");
        String t = typed.strip();
        if (t.length() > MAX_TEXT)
            throw new InputError(field, t.length() + " characters", "must be at most " + MAX_TEXT + " characters");
        return t;
    }
}
