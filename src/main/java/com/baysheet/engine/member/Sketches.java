package com.baysheet.engine.member;

import com.baysheet.engine.beam.BeamActions;
import com.baysheet.engine.beam.BeamLoads;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.Sketch;

import java.util.ArrayList;
import java.util.List;

/** Builds a member's load-diagram sketch from its dead and design live loads. */
final class Sketches {
    private Sketches() {}

    static Sketch of(Support s, BeamLoads dead, BeamLoads live) { return of(s, dead, live, List.of()); }

    static Sketch of(Support s, BeamLoads dead, BeamLoads live, List<Sketch.Drift> drift) {
        if (s instanceof Support.Axial) return Sketch.NONE;
        String kind = s instanceof Support.Simple ? "simple" : s instanceof Support.Overhang ? "overhang" : "cantilever";
        List<Sketch.Segment> seg = new ArrayList<>();
        for (int i = 0; i < dead.distributedCount(); i++) seg.add(new Sketch.Segment(dead.a(i), dead.b(i), dead.w(i), 0));
        for (int i = 0; i < live.distributedCount(); i++) seg.add(new Sketch.Segment(live.a(i), live.b(i), 0, live.w(i)));
        List<Sketch.Point> pts = new ArrayList<>();
        for (int i = 0; i < dead.pointCount(); i++) pts.add(new Sketch.Point(dead.x(i), dead.p(i), 0));
        for (int i = 0; i < live.pointCount(); i++) pts.add(new Sketch.Point(live.x(i), 0, live.p(i)));
        BeamActions a = MemberCalculation.solve(s, new BeamLoads().add(dead, 1).add(live, 1), Double.NaN);
        return new Sketch(kind, s.length(), s.span(), merge(seg), mergePoints(pts), a.left(), a.right(), drift);
    }

    /** Dead and live segments over the same stretch become one segment. */
    private static List<Sketch.Segment> merge(List<Sketch.Segment> in) {
        List<Sketch.Segment> out = new ArrayList<>();
        for (Sketch.Segment s : in) {
            int k = -1;
            for (int i = 0; i < out.size(); i++)
                if (out.get(i).from() == s.from() && out.get(i).to() == s.to()) k = i;
            if (k < 0) out.add(s);
            else out.set(k, new Sketch.Segment(s.from(), s.to(), out.get(k).dead() + s.dead(), out.get(k).live() + s.live()));
        }
        return out;
    }

    private static List<Sketch.Point> mergePoints(List<Sketch.Point> in) {
        List<Sketch.Point> out = new ArrayList<>();
        for (Sketch.Point p : in) {
            int k = -1;
            for (int i = 0; i < out.size(); i++) if (out.get(i).x() == p.x()) k = i;
            if (k < 0) out.add(p);
            else out.set(k, new Sketch.Point(p.x(), out.get(k).dead() + p.dead(), out.get(k).live() + p.live()));
        }
        out.sort(java.util.Comparator.comparingDouble(Sketch.Point::x));
        return out;
    }
}
