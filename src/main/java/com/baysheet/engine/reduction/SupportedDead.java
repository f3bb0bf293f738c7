package com.baysheet.engine.reduction;

import com.baysheet.engine.Check;

/**
 * The dead load a member's tributary area brings with it: the dead load of its strips and areas (pressure × area)
 * and that of the carried members' reactions that bring area. The member's own weight and line loads placed on it
 * are left out. A method that weighs the dead load against the live (the IBC alternative's D/L0) takes D from here.
 *
 * @param load lb or kN
 * @param area the tributary area that load comes with, ft² or m², roofs included
 */
public record SupportedDead(double load, double area) {
    public static final SupportedDead NONE = new SupportedDead(0, 0);

    public SupportedDead {
        Check.nonNegative("dead load", load);
        Check.nonNegative("area", area);
    }

    /** D, the dead load per unit area (psf or kN/m²); 0 where no area brings a dead load. */
    public double pressure() { return area > 0 ? load / area : 0; }

    public SupportedDead plus(double load, double area) { return new SupportedDead(this.load + load, this.area + area); }
}
