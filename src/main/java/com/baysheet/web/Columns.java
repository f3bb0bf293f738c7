package com.baysheet.web;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** Where each named column of a table is, from its header row. */
final class Columns {
    static final List<String> NAMES = List.of("kind", "name", "spacing", "elevation", "roof", "roof_slope", "same_as", "repeat",
            "storey_height");

    private final Map<String, Integer> at;

    private Columns(Map<String, Integer> at) { this.at = at; }

    /** The columns of this header, or null with the refusal recorded where kind or name is missing or a column unknown. */
    static Columns of(String[] header, List<String> refusals) {
        Map<String, Integer> at = new HashMap<>();
        for (int i = 0; i < header.length; i++) {
            String h = header[i].toLowerCase(Locale.ROOT).strip();
            if (!NAMES.contains(h)) {
                refusals.add("header: unknown column \"" + header[i] + "\" (the columns are " + String.join(", ", NAMES) + ")");
                return null;
            }
            if (at.put(h, i) != null) {
                refusals.add("header: column " + h + " given twice");
                return null;
            }
        }
        if (!at.containsKey("kind") || !at.containsKey("name")) {
            refusals.add("header: the columns kind and name are required");
            return null;
        }
        return new Columns(at);
    }

    /** The row's value in that column, "" where the row is short or the column absent. */
    String get(String[] row, String column) {
        Integer i = at.get(column);
        return i == null || i >= row.length ? "" : row[i];
    }

}
