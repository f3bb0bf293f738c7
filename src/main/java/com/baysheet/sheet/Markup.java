package com.baysheet.sheet;

import com.baysheet.engine.InputError;

import java.util.List;

/**
 * A checker's markup on a checking copy. {@code target} is a step symbol or an input key of the record
 * (the marked row carries the markup's number), or blank for the sheet as a whole.
 */
public record Markup(String target, String author, String text, boolean resolved, List<Reply> replies) {
    public Markup {
        target = target == null ? "" : target.strip();
        if (author == null || author.isBlank()) throw new InputError("markup.author", "\"\"", "a markup needs its author");
        if (text == null || text.isBlank()) throw new InputError("markup.text", "\"\"", "a markup needs its text");
        replies = List.copyOf(replies);
    }

    public record Reply(String author, String text) {
        public Reply {
            if (author == null || author.isBlank()) throw new InputError("reply.author", "\"\"", "a reply needs its author");
            if (text == null || text.isBlank()) throw new InputError("reply.text", "\"\"", "a reply needs its text");
        }
    }
}
