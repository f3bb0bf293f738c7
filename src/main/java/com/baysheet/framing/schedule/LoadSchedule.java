package com.baysheet.framing.schedule;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * A load summary as a table: named columns, some of them quantities, and rows of cells. Every number is
 * copied from a take-down row or a member's record, in the system's base unit at full precision; the
 * renderers convert it to the column's shown unit (kip, kip·ft; kN, kN·m) and round only what they print.
 *
 * @param key     the schedule's name in paths and file names ("column-loads")
 * @param columns the headings; a column with a quantity holds numbers, one without holds text
 * @param rows    each row one cell per column: a {@link String} in a text column, a {@link Double} in a
 *                number column (NaN where the value does not apply, such as the second reaction of a cantilever)
 * @param notes   what a reader needs to read the table right (which combinations govern, what the envelope is)
 */
public record LoadSchedule(String key, String title, UnitSystem system, List<Column> columns, List<List<Object>> rows,
                           List<String> notes) {
    public LoadSchedule {
        if (key == null || !key.matches("[a-z-]+")) throw new InputError("key", key, "must be lower-case words joined by hyphens");
        if (title == null || title.isBlank()) throw new InputError("title", "\"\"", "a schedule needs a title");
        if (system == null) throw new InputError("system", "none", "a schedule needs its unit system");
        columns = List.copyOf(columns);
        List<List<Object>> copy = new ArrayList<>();
        for (int r = 0; r < rows.size(); r++) {
            List<Object> row = rows.get(r);
            if (row.size() != columns.size())
                throw new InputError("rows[" + r + "]", row.size() + " cells", "must have one cell per column (" + columns.size() + ")");
            for (int c = 0; c < row.size(); c++) {
                Object cell = row.get(c);
                boolean ok = columns.get(c).isNumber() ? cell instanceof Double : cell instanceof String;
                if (!ok) throw new InputError("rows[" + r + "][" + columns.get(c).heading() + "]", cell, "is not a "
                        + (columns.get(c).isNumber() ? "number" : "text") + " as its column holds");
            }
            copy.add(List.copyOf(row));
        }
        rows = List.copyOf(copy);
        notes = List.copyOf(notes);
    }

    /** @param quantity what the column's numbers are, or null for a text column */
    public record Column(String heading, Quantity quantity) {
        public Column {
            if (heading == null || heading.isBlank()) throw new InputError("heading", "\"\"", "a column needs a heading");
        }

        public static Column text(String heading) { return new Column(heading, null); }

        public boolean isNumber() { return quantity != null; }
    }

    /** The column's heading with its shown unit: "D (kip)". */
    public String heading(int column) {
        Column c = columns.get(column);
        return c.isNumber() ? c.heading() + " (" + c.quantity().unit(system).symbol() + ")" : c.heading();
    }

    /** A number cell in the column's shown unit, full precision (NaN where it does not apply). */
    public double shown(int row, int column) {
        double base = (Double) rows.get(row).get(column);
        return Double.isNaN(base) ? base : columns.get(column).quantity().unit(system).fromBase(base);
    }

    /** The column's index by heading (without unit). */
    public int column(String heading) {
        for (int i = 0; i < columns.size(); i++) if (columns.get(i).heading().equals(heading)) return i;
        throw new IllegalArgumentException("no column " + heading + " in " + title);
    }
}
