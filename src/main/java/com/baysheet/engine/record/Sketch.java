package com.baysheet.engine.record;

import com.fasterxml.jackson.annotation.JsonInclude;

import java.util.List;

/**
 * What a load diagram needs, in system base units: the support, lengths, the service loads (dead and
 * design live, reduced; roof live included in live) and the service reactions D + L + Lr.
 *
 * @param support "simple", "overhang", "cantilever" or "axial"
 * @param drift   the snow drift surcharge at a roof step on the member, as linear loads (left out of the JSON where
 *                there is none, so records without drift keep their text and their fingerprints)
 */
public record Sketch(String support, double length, double span, List<Segment> distributed, List<Point> points,
                     double leftReaction, double rightReaction, @JsonInclude(JsonInclude.Include.NON_EMPTY) List<Drift> drift) {
    public Sketch {
        distributed = List.copyOf(distributed);
        points = List.copyOf(points);
        drift = drift == null ? List.of() : List.copyOf(drift);
    }

    /** No drift. */
    public Sketch(String support, double length, double span, List<Segment> distributed, List<Point> points,
                  double leftReaction, double rightReaction) {
        this(support, length, span, distributed, points, leftReaction, rightReaction, List.of());
    }

    /** A drift surcharge from {@code from} to {@code to}, linear from {@code start} to {@code end} (plf or kN/m). */
    public record Drift(double from, double to, double start, double end) {}

    /** A distributed load from {@code from} to {@code to}: dead and live intensity (plf or kN/m). */
    public record Segment(double from, double to, double dead, double live) {}

    /** A point load at {@code x}: dead and live (lb or kN). */
    public record Point(double x, double dead, double live) {}

    public static final Sketch NONE = new Sketch("axial", 0, 0, List.of(), List.of(), 0, 0);
}
