package com.baysheet.framing;

import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.LineLoad;
import com.baysheet.engine.load.PointLoad;

import java.util.ArrayList;
import java.util.List;

/**
 * A grid-line member between two adjacent grid points while its loads are gathered from the bays on
 * either side: slab strips (with their plan outlines) and infill beam reactions.
 */
final class Segment {
    final boolean alongX;
    final int i, j;
    final double length;
    final List<AreaStrip> strips = new ArrayList<>();
    final List<PointLoad> points = new ArrayList<>();
    /** Line loads along the member (cladding, walls): they load it but make it no member where there is none. */
    final List<LineLoad> lineLoads = new ArrayList<>();
    /** Point loads applied to the member (a rooftop unit): they load it but make it no girder and no member where there is none. */
    final List<PointLoad> applied = new ArrayList<>();
    final List<PlanRect> outline = new ArrayList<>();
    /** The plan outline of each slab strip, in the order of {@link #strips} (for the drift at a roof step). */
    final List<PlanRect> stripRects = new ArrayList<>();
    final List<String> bays = new ArrayList<>();
    boolean cantilever;
    double direct;

    Segment(boolean alongX, int i, int j, double length) {
        this.alongX = alongX;
        this.i = i;
        this.j = j;
        this.length = length;
    }

    void strip(String occupancy, double width, double dead, PlanRect rect, String bay) {
        strips.add(new AreaStrip(occupancy, width, 0, length, dead));
        outline.add(rect);
        stripRects.add(rect);
        direct += width * length;
        serves(bay);
    }

    void point(PointLoad p, PlanRect rect, String bay) {
        points.add(p);
        outline.add(rect);
        serves(bay);
    }

    boolean loaded() { return !strips.isEmpty() || !points.isEmpty(); }

    private void serves(String bay) {
        if (!bays.contains(bay)) bays.add(bay);
    }
}
