package com.baysheet.review;

import com.baysheet.engine.InputError;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A text search over a project's mark sheets, in any case: each word typed must appear in the sheet's mark or its
 * members' role, or else all the remaining words in one of the locations it lists (level and grid place, the
 * member's name: "Level 2: Girder A/1-2"), so that "Level 2" A/1-2 finds the girder on that line of that level and
 * not one on another level. Words in double quotes are one phrase ("Level 2"). Blank text admits every sheet.
 */
public record SheetSearch(String text, List<String> words) {
    /** The longest search text taken; a longer one is refused, naming the field. */
    public static final int MAX_LENGTH = 100;

    public SheetSearch {
        text = text == null ? "" : text;
        words = List.copyOf(words);
    }

    /** A phrase in double quotes, or a run of anything but blanks and quotes. */
    private static final Pattern WORD = Pattern.compile("\"([^\"]*)\"?|([^\\s\"]+)");

    public static final SheetSearch ANY = of("");

    /** The search the person typed in the field {@code q}. */
    public static SheetSearch of(String typed) {
        String t = typed == null ? "" : typed.strip();
        if (t.length() > MAX_LENGTH)
            throw new InputError("q", t.length() + " characters", "a search is at most " + MAX_LENGTH + " characters");
        List<String> words = new ArrayList<>();
        Matcher m = WORD.matcher(t.toLowerCase(Locale.ROOT));
        while (m.find()) {
            String w = (m.group(1) != null ? m.group(1) : m.group(2)).strip().replaceAll("\\s+", " ");
            if (!w.isEmpty() && !words.contains(w)) words.add(w);
        }
        return new SheetSearch(t, words);
    }

    public boolean isEmpty() { return words.isEmpty(); }

    public boolean admits(MarkSheets.MarkSheet s) {
        if (words.isEmpty()) return true;
        String named = (s.text() + "\n" + s.group().role().name().replace('_', ' ')).toLowerCase(Locale.ROOT);
        List<String> rest = words.stream().filter(w -> !named.contains(w)).toList();
        if (rest.isEmpty()) return true;
        return s.group().locations().stream().map(l -> l.toLowerCase(Locale.ROOT)).anyMatch(l -> rest.stream().allMatch(l::contains));
    }
}
