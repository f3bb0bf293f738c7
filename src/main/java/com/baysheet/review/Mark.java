package com.baysheet.review;

import com.baysheet.engine.InputError;
import com.baysheet.framing.MemberRole;

import java.util.Objects;
import java.util.regex.Pattern;

/**
 * A typical member's mark as stored: its prefix and number (which never change, so nothing renumbers), the
 * text the sheets print (the prefix and number until the firm renames it), the fingerprint of the calculation it
 * was last given, the mark it was split from, and whether any member carries it now.
 *
 * @param id       0 for a mark not stored yet
 * @param calc     {@link CalcFingerprint} of the group's calculation under a neutral subject
 * @param originId the mark this one was split from by a change, or null
 */
public record Mark(long id, String prefix, int seq, String text, String calc, Long originId, boolean active) {
    /** What a firm may call a mark: letters, digits and a few joiners, as drawings print them. */
    private static final Pattern TEXT = Pattern.compile("[A-Za-z0-9][A-Za-z0-9.\\-/]{0,11}");

    public Mark {
        if (prefix == null || prefix.isBlank()) throw new IllegalArgumentException("prefix: required");
        if (seq < 1) throw new IllegalArgumentException("seq: numbers count from 1 (got " + seq + ")");
        text = checkedText(text);
    }

    /**
     * The prefix of a role: B an infill beam, GB a beam on a grid line (slab only), G a girder (it carries
     * beams), C a column.
     */
    public static String prefix(MemberRole role) {
        return switch (role) {
            case INFILL_BEAM -> "B";
            case GRID_BEAM -> "GB";
            case GIRDER -> "G";
            case COLUMN -> "C";
        };
    }

    /** A mark's text as typed, refused naming the field where it is not one a sheet can print. */
    public static String checkedText(String text) {
        String t = text == null ? "" : text.strip();
        if (!TEXT.matcher(t).matches())
            throw new InputError("mark", "\"" + t + "\"", "a mark is 1 to 12 letters or digits (and . - /), starting with a letter or digit");
        return t;
    }

    public Mark renamed(String to) { return new Mark(id, prefix, seq, to, calc, originId, active); }

    public Mark given(String newCalc, boolean nowActive) {
        // the same mark where nothing changes: a write gives most marks of a large building as they were
        if (nowActive == active && Objects.equals(newCalc, calc)) return this;
        return new Mark(id, prefix, seq, text, newCalc, originId, nowActive);
    }
}
