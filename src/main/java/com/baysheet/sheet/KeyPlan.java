package com.baysheet.sheet;

import java.util.List;

/**
 * Plain plan geometry for a sheet's key plan, in the project's base length (ft or m): the level's grid
 * lines, its framed bays, the member's line and its tributary outline. Kept free of the framing model so
 * that the sheet only draws what it is given.
 */
public record KeyPlan(String level, List<GridLine> gridLines, List<Rect> bays, Line member, List<Rect> tributary) {
    public KeyPlan {
        gridLines = List.copyOf(gridLines);
        bays = List.copyOf(bays);
        tributary = List.copyOf(tributary);
        if (gridLines.isEmpty()) throw new com.baysheet.engine.InputError("keyPlan.gridLines", 0, "a key plan needs grid lines");
        if (member == null) throw new com.baysheet.engine.InputError("keyPlan.member", "none", "a key plan needs the member's line");
    }

    /** A grid line: {@code alongX} lines sit at x = position and run in y. */
    public record GridLine(String name, boolean alongX, double position) {}

    public record Rect(double x1, double y1, double x2, double y2) {
        public double minX() { return Math.min(x1, x2); }
        public double minY() { return Math.min(y1, y2); }
        public double maxX() { return Math.max(x1, x2); }
        public double maxY() { return Math.max(y1, y2); }
    }

    /** A member on plan; a column is a line of zero length. */
    public record Line(double x1, double y1, double x2, double y2) {
        public boolean isPoint() { return x1 == x2 && y1 == y2; }
    }
}
