package com.baysheet.framing;

/** Where a derived member sits in the framing. */
public enum MemberRole {
    /** a beam between grid lines, spanning girder to girder */
    INFILL_BEAM,
    /** a member on a grid line that carries slab only (no infill beams frame into it) */
    GRID_BEAM,
    /** a member on a grid line that carries infill beams */
    GIRDER,
    /** a column at a grid intersection, one entry per level */
    COLUMN
}
