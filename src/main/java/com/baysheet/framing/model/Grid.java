package com.baysheet.framing.model;

import com.baysheet.engine.Check;

/**
 * An orthogonal grid: {@code x} lines sit at positions along the x axis (they run north-south),
 * {@code y} lines at positions along y (they run east-west). A bay is the cell between two adjacent
 * lines of each.
 */
public record Grid(GridAxis x, GridAxis y) {
    public Grid {
        Check.present("grid.x", x);
        Check.present("grid.y", y);
    }

    /** The bay's name in the trade's form, e.g. "A-B/1-2". */
    public String bayName(int col, int row) {
        return y.name(row) + "-" + y.name(row + 1) + "/" + x.name(col) + "-" + x.name(col + 1);
    }

    /** A grid intersection's name, e.g. "B/2". */
    public String pointName(int xLine, int yLine) {
        return y.name(yLine) + "/" + x.name(xLine);
    }
}
