package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Side;

/**
 * A column's place in the plan of a level, and so its row of Table 4.7-1: interior (four floored bays
 * around it), edge (two side by side) or corner (one, or three at a re-entrant corner); with or without a
 * cantilever slab touching it.
 */
public enum ColumnClass {
    INTERIOR, EDGE, CORNER;

    static ColumnClass at(LevelPlan p, int i, int j) {
        Bay sw = p.floored(i - 1, j - 1), se = p.floored(i, j - 1), nw = p.floored(i - 1, j), ne = p.floored(i, j);
        int n = (sw != null ? 1 : 0) + (se != null ? 1 : 0) + (nw != null ? 1 : 0) + (ne != null ? 1 : 0);
        if (n == 4) return INTERIOR;
        boolean diagonal = (sw != null && ne != null) || (se != null && nw != null);
        if (n == 2 && !diagonal) return EDGE;
        return CORNER;
    }

    static boolean cantileverTouches(LevelPlan p, int i, int j) {
        return touches(p.floored(i - 1, j - 1), Side.NORTH, Side.EAST) || touches(p.floored(i, j - 1), Side.NORTH, Side.WEST)
                || touches(p.floored(i - 1, j), Side.SOUTH, Side.EAST) || touches(p.floored(i, j), Side.SOUTH, Side.WEST);
    }

    private static boolean touches(Bay b, Side a, Side c) {
        return b != null && (b.cantilevers().containsKey(a) || b.cantilevers().containsKey(c));
    }

    MemberKind kind(boolean cantilever) {
        return switch (this) {
            case INTERIOR -> MemberKind.INTERIOR_COLUMN;
            case EDGE -> cantilever ? MemberKind.EDGE_COLUMN_CANTILEVER : MemberKind.EXTERIOR_COLUMN;
            case CORNER -> cantilever ? MemberKind.CORNER_COLUMN_CANTILEVER : MemberKind.EXTERIOR_COLUMN;
        };
    }

    /** The class as the records name it: "corner", "edge", written once (every column of a building asks). */
    public String label() { return label; }

    private final String label = name().toLowerCase(java.util.Locale.ROOT);
}
