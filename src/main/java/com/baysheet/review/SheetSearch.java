package com.baysheet.review;

import com.baysheet.engine.InputError;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * A text search over a project's mark sheets: each word typed must appear, in any case, in the sheet's mark, its
 * members' role, or one of the locations it lists (level and grid place, the member's name: "L2: Beam A-B/1-2 #1").
 * Words narrow the search, so "L2 G" finds the girders on L2. Blank text admits every sheet.
 */
public record SheetSearch(String text, List<String> words) {
    /** The longest search text taken; a longer one is refused, naming the field. */
    public static final int MAX_LENGTH = 100;

    public SheetSearch {
        text = text == null ? "" : text;
        words = List.copyOf(words);
    }

    public static final SheetSearch ANY = of("");

    /** The search the person typed in the field {@code q}. */
    public static SheetSearch of(String typed) {
        String t = typed == null ? "" : typed.strip();
        if (t.length() > MAX_LENGTH)
            throw new InputError("q", t.length() + " characters", "a search is at most " + MAX_LENGTH + " characters");
        List<String> words = t.isEmpty() ? List.of()
                : Arrays.stream(t.toLowerCase(Locale.ROOT).split("\\s+")).distinct().toList();
        return new SheetSearch(t, words);
    }

    public boolean isEmpty() { return words.isEmpty(); }

    public boolean admits(MarkSheets.MarkSheet s) {
        if (words.isEmpty()) return true;
        String hay = haystack(s);
        return words.stream().allMatch(hay::contains);
    }

    /** What a sheet is found by: mark, role in words, and every location, one per line so no word spans two. */
    private static String haystack(MarkSheets.MarkSheet s) {
        String role = s.group().role().name().replace('_', ' ');
        return (s.text() + "\n" + role + "\n" + String.join("\n", s.group().locations())).toLowerCase(Locale.ROOT);
    }
}
