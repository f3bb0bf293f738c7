package com.baysheet.web.entry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Splits a typed list of lengths ("30 30 25", "25'-6\" 30' 24'-6 1/2\"", "7500 mm, 7.5 m") into the text of
 * each. With a comma or semicolon in it the list is split there only; otherwise at spaces, keeping together
 * what belongs to one length: a unit after its number, a fraction after its whole number, and inches
 * marked with {@code "} after their feet. A foot mark followed by a bare number ({@code 25' 6}) could be
 * 25'-6" or two spacings, and is refused.
 */
public final class LengthList {
    private LengthList() {}

    public static List<String> split(String typed, String label) {
        String t = typed.strip();
        if (t.isEmpty()) return List.of();
        if (t.contains(",") || t.contains(";"))
            return Arrays.stream(t.split("\\s*[,;]+\\s*")).filter(s -> !s.isBlank()).toList();
        String[] w = t.split("\\s+");
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder(w[0]);
        for (int i = 1; i < w.length; i++) {
            String c = cur.toString();
            boolean join = w[i].matches("(?i)mm|m|ft|in|\"|'|-") || c.endsWith("-") || w[i].startsWith("-") && c.endsWith("'")
                    || w[i].matches("\\d+/\\d+\"?")
                    || c.endsWith("'") && !w[i].contains("'") && (w[i].endsWith("\"") || w[i].matches("[\\d.]+") && nextIsInchFraction(w, i));
            if (!join && c.endsWith("'") && w[i].matches("[\\d.]+"))
                throw new EntryRefused(label, typed, "\"" + c + " " + w[i] + "\" could be one length or two: write "
                        + c + "-" + w[i] + "\" for one, or separate the lengths with commas");
            if (join) cur.append(' ').append(w[i]);
            else {
                out.add(c);
                cur = new StringBuilder(w[i]);
            }
        }
        out.add(cur.toString());
        return out;
    }

    /** 25' 6 1/2": the whole inches are followed by a fraction with the inch mark. */
    private static boolean nextIsInchFraction(String[] w, int i) {
        return i + 1 < w.length && w[i + 1].matches("\\d+/\\d+\"");
    }
}
