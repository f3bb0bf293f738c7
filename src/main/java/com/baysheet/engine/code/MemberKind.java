package com.baysheet.engine.code;

/**
 * The member rows of the live load element factor table (ASCE 7-16 Table 4.7-1). The K_LL values
 * themselves are data, per edition, in editions.json. {@code column} members carry axial load only.
 */
public enum MemberKind {
    INTERIOR_COLUMN("Interior column", true),
    EXTERIOR_COLUMN("Exterior column without cantilever slab", true),
    EDGE_COLUMN_CANTILEVER("Edge column with cantilever slab", true),
    CORNER_COLUMN_CANTILEVER("Corner column with cantilever slab", true),
    EDGE_BEAM("Edge beam without cantilever slab", false),
    INTERIOR_BEAM("Interior beam", false),
    EDGE_BEAM_CANTILEVER("Edge beam with cantilever slab", false),
    CANTILEVER_BEAM("Cantilever beam", false),
    ONE_WAY_SLAB("One-way slab", false),
    TWO_WAY_SLAB("Two-way slab", false),
    NO_SHEAR_TRANSFER("Member without provision for continuous shear transfer normal to its span", false);

    private final String title;
    private final boolean column;

    MemberKind(String title, boolean column) {
        this.title = title;
        this.column = column;
    }

    public String title() { return title; }

    public boolean isColumn() { return column; }

    public static MemberKind parse(String field, String text) {
        for (MemberKind k : values()) if (k.name().equalsIgnoreCase(text)) return k;
        throw new com.baysheet.engine.InputError(field, text, "is not a member kind of the live load element factor table");
    }
}
