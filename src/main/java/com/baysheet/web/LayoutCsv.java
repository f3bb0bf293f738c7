package com.baysheet.web;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.store.LayoutImport;
import com.baysheet.store.TypicalRepeat;
import com.baysheet.project.LevelInfo;
import com.baysheet.web.entry.EntryRefused;
import com.baysheet.web.entry.LengthField;
import com.baysheet.web.entry.Lengths;
import com.baysheet.web.entry.Slopes;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A grid and levels as a table (docs/api.md): a header row naming the columns {@code kind, name, spacing, elevation,
 * roof, roof_slope, same_as, repeat, storey_height} in any order (the last six may be left out), then one row per grid line ({@code kind} x
 * or y, in order west to east or south to north, {@code spacing} to the next line and blank on the last) or per level
 * ({@code kind} level; {@code repeat} N with a {@code storey_height} adds N levels above it, the same as it). Lengths and slopes are read as on the forms (30'-6", 9.1 m, 1/4, 2%). Blank lines and lines
 * starting with # are skipped. Every refusal is collected, naming its row, so a file is corrected in one go.
 */
record LayoutCsv(Grid grid, List<LayoutImport.Row> levels, List<String> refusals) {
    /** Lines of a table past this are refused before any is read (a grid has at most a few hundred lines). */
    static final int MAX_ROWS = 2_000;

    static LayoutCsv read(String text, UnitSystem units) {
        List<String> refusals = new ArrayList<>();
        List<String[]> rows = new ArrayList<>();
        List<Integer> numbers = new ArrayList<>();
        String[] lines = text.split("\r?\n", -1);
        if (lines.length > MAX_ROWS) return refused("has " + lines.length + " lines; a table may have at most " + MAX_ROWS);
        String[] header = null;
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i].strip();
            if (line.isEmpty() || line.startsWith("#")) continue;
            if (header == null) header = CsvLine.split(line);
            else {
                rows.add(CsvLine.split(line));
                numbers.add(i + 1);
            }
        }
        if (header == null) return refused("is empty: give a header row (kind,name,spacing,elevation,roof,roof_slope,same_as) and rows");
        Columns cols = Columns.of(header, refusals);
        if (cols == null) return new LayoutCsv(null, List.of(), refusals);
        List<String> xNames = new ArrayList<>(), yNames = new ArrayList<>();
        List<String> xSp = new ArrayList<>(), ySp = new ArrayList<>();
        List<Integer> xRows = new ArrayList<>(), yRows = new ArrayList<>();
        List<LayoutImport.Row> levels = new ArrayList<>();
        for (int r = 0; r < rows.size(); r++) {
            String[] row = rows.get(r);
            int n = numbers.get(r);
            String kind = cols.get(row, "kind").toLowerCase(Locale.ROOT), name = cols.get(row, "name");
            if (name.isEmpty()) { refusals.add("row " + n + ": name is required"); continue; }
            switch (kind) {
                case "x", "y" -> {
                    (kind.equals("x") ? xNames : yNames).add(name);
                    (kind.equals("x") ? xSp : ySp).add(cols.get(row, "spacing"));
                    (kind.equals("x") ? xRows : yRows).add(n);
                }
                case "level" -> level(cols, row, n, name, units, refusals, levels);
                default -> refusals.add("row " + n + ": kind must be x, y or level (got \"" + kind + "\")");
            }
        }
        Grid grid = null;
        if (!xNames.isEmpty() || !yNames.isEmpty()) {
            GridAxis x = axis("x", xNames, xSp, xRows, units, refusals), y = axis("y", yNames, ySp, yRows, units, refusals);
            if (x != null && y != null) grid = new Grid(x, y);
        }
        return new LayoutCsv(grid, levels, refusals);
    }

    private static LayoutCsv refused(String why) {
        return new LayoutCsv(null, List.of(), List.of("the table " + why));
    }

    private static void level(Columns cols, String[] row, int n, String name, UnitSystem units, List<String> refusals,
                              List<LayoutImport.Row> out) {
        String at = "row " + n + " (" + name + "): ";
        try {
            double elevation = Lengths.read(cols.get(row, "elevation"), LengthField.elevation("elevation"), units);
            String roofText = cols.get(row, "roof").toLowerCase(Locale.ROOT);
            boolean roof = roofText.equals("yes") || roofText.equals("true") || roofText.equals("roof");
            if (!roof && !roofText.isEmpty() && !roofText.equals("no") && !roofText.equals("false"))
                throw new InputError("roof", roofText, "must be yes or no");
            double slope = roof ? Slopes.read(cols.get(row, "roof_slope"), "roof_slope", units) : Double.NaN;
            String sameAs = cols.get(row, "same_as");
            TypicalRepeat above = above(cols, row, name, units);
            if (above != null && !sameAs.isEmpty())
                throw new InputError("repeat", above.count(), "cannot go with same_as: give the repeat on the row of " + sameAs);
            out.add(new LayoutImport.Row(new LevelInfo(name, elevation, roof, slope), sameAs.isEmpty() ? null : sameAs, above));
        } catch (EntryRefused e) {
            refusals.add(at + e.getMessage());
        } catch (InputError e) {
            refusals.add(at + e.getMessage());
        }
    }

    /** The repeat column: that many levels above this one, the same as it, storey_height apart (blank: none). */
    private static TypicalRepeat above(Columns cols, String[] row, String name, UnitSystem units) {
        String count = cols.get(row, "repeat").strip();
        if (count.isEmpty() || count.equals("0")) {
            if (!cols.get(row, "storey_height").isBlank()) throw new InputError("storey_height", cols.get(row, "storey_height"),
                    "is given without a repeat count");
            return null;
        }
        if (!count.matches("\\d{1,9}")) throw new InputError("repeat", count, "must be a whole number of levels (blank for none)");
        double height = Lengths.read(cols.get(row, "storey_height"), LengthField.span("storey_height"), units);
        return new TypicalRepeat(Integer.parseInt(count), height, "levels[" + name + "].repeat", "levels[" + name + "].storey_height");
    }

    private static GridAxis axis(String axis, List<String> names, List<String> spacings, List<Integer> rows, UnitSystem units,
                                 List<String> refusals) {
        if (names.size() < 2) {
            refusals.add("grid lines along " + axis + ": give at least two rows of kind " + axis + " (a table with grid lines gives both axes)");
            return null;
        }
        List<Double> sp = new ArrayList<>();
        int before = refusals.size();
        for (int i = 0; i < names.size(); i++) {
            String t = spacings.get(i);
            boolean last = i == names.size() - 1;
            if (last) {
                if (!t.isEmpty()) refusals.add("row " + rows.get(i) + ": the last line along " + axis + " has no spacing after it (got \"" + t + "\")");
                continue;
            }
            try {
                sp.add(Lengths.read(t, LengthField.span("spacing after " + names.get(i)), units));
            } catch (EntryRefused e) {
                refusals.add("row " + rows.get(i) + ": " + e.getMessage());
            }
        }
        if (refusals.size() > before) return null;
        try {
            return new GridAxis(axis, names, sp);
        } catch (InputError e) {
            refusals.add(e.getMessage());
            return null;
        }
    }
}
