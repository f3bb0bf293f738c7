package com.baysheet.engine;

/**
 * The engine's tolerances, in one place. Each is relative (a share of a member's length, of an area, of a
 * load), so that it means the same in US and SI units and on a short beam and a long one. None decides a
 * code limit: they only tell rounding residue from a real difference.
 */
public final class Tolerances {
    private Tolerances() {}

    /**
     * Two positions along a member coincide (a point load at a support, a strip ending where another begins), as
     * a share of the member's length. Positions come from sums of a few spacings, exact to about 1e-16 of the
     * length; an entered length is never finer than about 1e-7 of it (a thousandth of an inch on 1000 ft).
     */
    public static final double SAME_POSITION = 1e-12;

    /**
     * A bending moment extreme below this share of (total load × length, or 1) is the rounding residue of zero (no
     * negative moment on a simple span, where many terms cancel), printed as 0 rather than as -3e-13.
     */
    public static final double ZERO_MOMENT = 1e-12;

    /**
     * A load placed past a member's end by less than this share of its length is on the member: a strip's end and
     * the member's length are sums of the same spacings in another order, a few ulps apart; a real overrun is
     * millions of times more.
     */
    public static final double WITHIN_LENGTH = 1e-9;

    /**
     * A uniform load covers the whole span when its ends lie within this share of the span of the supports, so that
     * the closed-form formulas for a full uniform load are printed (the same rounding as {@link #WITHIN_LENGTH}).
     */
    public static final double FULL_SPAN = 1e-9;

    /**
     * Where the search for the governing position of a concentrated load stops, as a share of the member's length:
     * below this the moment and shear no longer change in the three significant figures shown.
     */
    public static final double LOAD_POSITION = 1e-9;

    /**
     * Two areas (ft² or m²) are the same, relative to the larger (and to 1 for areas near zero): the floors a column
     * lists and the areas its loads carry, or a take-down's reducible area and its whole A_T, are the same tributary
     * areas summed in another order.
     */
    public static final double SAME_AREA = 1e-9;

    /**
     * L0 of a roof row is the ordinary roof's when within this share of the edition's {@code roof.ordinary}: the
     * code's SI value 0.96 kN/m² is 20.05 psf and 20 psf is 0.9576 kN/m², so a row entered in either system stays
     * ordinary in both (0.25 % apart). Wide enough for that, far too narrow to take a 21 psf roof for 20.
     */
    public static final double ORDINARY_ROOF = 0.005;
}
