package com.baysheet.project;

import com.baysheet.engine.InputError;

/** A grid cell: column index along x, row index along y, from 0. */
public record Cell(int col, int row) {
    public Cell {
        if (col < 0) throw new InputError("cells", col, "a column index must be 0 or more");
        if (row < 0) throw new InputError("cells", row, "a row index must be 0 or more");
    }

    /** "col,row", as the bay editor's checkboxes carry it. */
    public static Cell parse(String text) {
        String[] p = text == null ? new String[0] : text.split(",");
        try {
            if (p.length == 2) return new Cell(Integer.parseInt(p[0].strip()), Integer.parseInt(p[1].strip()));
        } catch (NumberFormatException e) {
            // falls through to the error below, which names the text
        }
        throw new InputError("cells", text, "a cell is given as column,row (for example 0,2)");
    }

    public String key() { return col + "," + row; }
}
