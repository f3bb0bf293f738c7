package com.baysheet.engine.record;

import java.util.List;

/**
 * What a load diagram needs, in system base units: the support, lengths, the service loads (dead and
 * design live, reduced; roof live included in live) and the service reactions D + L + Lr.
 *
 * @param support "simple", "overhang", "cantilever" or "axial"
 */
public record Sketch(String support, double length, double span, List<Segment> distributed, List<Point> points,
                     double leftReaction, double rightReaction) {
    public Sketch {
        distributed = List.copyOf(distributed);
        points = List.copyOf(points);
    }

    /** A distributed load from {@code from} to {@code to}: dead and live intensity (plf or kN/m). */
    public record Segment(double from, double to, double dead, double live) {}

    /** A point load at {@code x}: dead and live (lb or kN). */
    public record Point(double x, double dead, double live) {}

    public static final Sketch NONE = new Sketch("axial", 0, 0, List.of(), List.of(), 0, 0);
}
