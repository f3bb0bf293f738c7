package com.baysheet.engine.load;

import com.baysheet.engine.Check;

/**
 * Floor area tributary to a beam: an occupancy over a tributary width, from {@code from} to {@code to}
 * along the span, with the superimposed dead load on it. It gives the beam a line load and a tributary area.
 *
 * @param width        tributary width normal to the span, ft or m
 * @param deadPressure dead load, psf or kN/m²
 */
public record AreaStrip(String occupancy, double width, double from, double to, double deadPressure) {
    public AreaStrip {
        Check.text("occupancy", occupancy);
        Check.positive("width", width);
        Check.nonNegative("from", from);
        Check.positive("to", to);
        if (to <= from) throw new com.baysheet.engine.InputError("to", to, "must be greater than from (" + from + ")");
        Check.nonNegative("deadPressure", deadPressure);
    }

    public double area() { return width * (to - from); }
}
