package com.baysheet.framing;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;

/** A level's bays indexed by grid cell, with the geometry the derivation asks of it. */
final class LevelPlan {
    final Level level;
    final Grid grid;
    final String id;
    private final Bay[][] cells;
    private final GridNames names;

    /** Another level of the building is higher than this one (a roof here has a step up to it). */
    final boolean belowAnother;

    LevelPlan(String id, Level level, Grid grid) { this(id, level, grid, false); }

    LevelPlan(String id, Level level, Grid grid, boolean belowAnother) { this(id, level, grid, belowAnother, new GridNames(grid)); }

    /** @param names the grid's names, shared by the levels of one derivation */
    LevelPlan(String id, Level level, Grid grid, boolean belowAnother, GridNames names) {
        this.names = names;
        this.belowAnother = belowAnother;
        this.id = id;
        this.level = level;
        this.grid = grid;
        this.cells = new Bay[grid.x().cells()][grid.y().cells()];
        this.xs = positions(grid.x());
        this.ys = positions(grid.y());
        for (Bay b : level.bays()) cells[b.col()][b.row()] = b;
    }

    /** The floored bay at a cell, or null for no bay, an opening or a cell outside the grid. */
    Bay floored(int col, int row) {
        if (col < 0 || row < 0 || col >= cells.length || row >= cells[0].length) return null;
        Bay b = cells[col][row];
        return b == null || b.opening() ? null : b;
    }

    /** The neighbouring cell's floored bay across a side. */
    Bay across(Bay b, Side s) {
        return switch (s) {
            case NORTH -> floored(b.col(), b.row() + 1);
            case SOUTH -> floored(b.col(), b.row() - 1);
            case EAST -> floored(b.col() + 1, b.row());
            case WEST -> floored(b.col() - 1, b.row());
        };
    }

    /** "3x7": the stable ids of x line i and y line j, as member ids name a grid point or a bay's corner. */
    String at(int i, int j) { return names.at(i, j); }

    /** The bay's name, {@link Grid#bayName}. */
    String bayName(int col, int row) { return names.bay(col, row); }

    double x(int line) { return xs[line]; }

    double y(int line) { return ys[line]; }

    int xCells() { return cells.length; }

    int yCells() { return cells[0].length; }

    /** Floored bays around a grid point, in the order SW, SE, NW, NE. */
    int flooredAround(int i, int j) {
        int n = 0;
        if (floored(i - 1, j - 1) != null) n++;
        if (floored(i, j - 1) != null) n++;
        if (floored(i - 1, j) != null) n++;
        if (floored(i, j) != null) n++;
        return n;
    }

    private final double[] xs, ys;

    private static double[] positions(com.baysheet.framing.model.GridAxis axis) {
        double[] p = new double[axis.lines()];
        for (int i = 1; i < p.length; i++) p[i] = p[i - 1] + axis.spacing(i - 1);
        return p;
    }
}
