package com.baysheet.framing;

import com.baysheet.framing.model.Grid;

/**
 * The names and ids of a grid's bays and points, each written once and shared by every level of a derivation: a
 * large building asks for the same bay name from each of its members and columns on every level. Filled as asked.
 */
final class GridNames {
    private final Grid grid;
    private final String[][] bays;
    private final String[][] points;

    GridNames(Grid grid) {
        this.grid = grid;
        this.bays = new String[grid.x().cells()][grid.y().cells()];
        this.points = new String[grid.x().lines()][grid.y().lines()];
    }

    /** {@link Grid#bayName}. */
    String bay(int col, int row) {
        String s = bays[col][row];
        if (s == null) bays[col][row] = s = grid.bayName(col, row);
        return s;
    }

    /** "3x7": the stable ids of x line i and y line j (see {@link LevelPlan#at}). */
    String at(int i, int j) {
        String s = points[i][j];
        if (s == null) points[i][j] = s = grid.x().id(i) + "x" + grid.y().id(j);
        return s;
    }
}
