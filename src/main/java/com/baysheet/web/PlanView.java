package com.baysheet.web;

import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.DriftZones;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.MemberRole;
import com.baysheet.framing.PlanLine;
import com.baysheet.framing.PlanRect;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.GridPointLoad;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A level's framing plan as SVG shapes, in screen units: grid lines with their names, bays shaded by
 * occupancy (with a legend), cantilever slabs, openings, members (each a link to its page) and the
 * selected member's tributary outline, and the level's line loads as thick labelled lines. Plan y (north) points up.
 */
record PlanView(double width, double height, List<Shape> bays, List<Shape> gridLines, List<Shape> gridLabels,
                List<Shape> members, List<Shape> tributary, Map<String, String> legend, List<Shape> lineLoads,
                List<Shape> drifts, List<Shape> pointLoads, List<Shape> marks, String drawnAt) {
    /** One drawn thing: a rectangle (x, y, w, h) or a line (x, y to x2, y2), with its class, fill, link and tooltip. */
    record Shape(double x, double y, double w, double h, double x2, double y2, String cls, String fill, String href, String title) {}

    /** A plan drawn where the template puts it. */
    PlanView(double width, double height, List<Shape> bays, List<Shape> gridLines, List<Shape> gridLabels,
             List<Shape> members, List<Shape> tributary, Map<String, String> legend, List<Shape> lineLoads,
             List<Shape> drifts, List<Shape> pointLoads, List<Shape> marks) {
        this(width, height, bays, gridLines, gridLabels, members, tributary, legend, lineLoads, drifts, pointLoads, marks, null);
    }

    /** A plan without line loads. */
    PlanView(double width, double height, List<Shape> bays, List<Shape> gridLines, List<Shape> gridLabels,
             List<Shape> members, List<Shape> tributary, Map<String, String> legend) {
        this(width, height, bays, gridLines, gridLabels, members, tributary, legend, List.of(), List.of(), List.of(), List.of());
    }

    /** A plan without drifts or point loads. */
    PlanView(double width, double height, List<Shape> bays, List<Shape> gridLines, List<Shape> gridLabels,
             List<Shape> members, List<Shape> tributary, Map<String, String> legend, List<Shape> lineLoads) {
        this(width, height, bays, gridLines, gridLabels, members, tributary, legend, lineLoads, List.of(), List.of(), List.of());
    }

    private static final double MAX_W = 760, MAX_H = 560, PAD = 36;

    /**
     * The plan as SVG markup, escaped; the template inserts it as it is. Where the plan is {@link #drawnLater drawn
     * later}, the marker of its place instead.
     */
    public String svg() { return drawnAt != null ? drawnAt : PlanSvg.of(this); }

    /**
     * This plan with {@code marker} in the place of its drawing, which the page's cache puts there after rendering
     * ({@link KeptPage}): a plan of thousands of members is then neither copied by the template engine nor read
     * through again by what the page is filled in with.
     */
    PlanView drawnLater(String marker) {
        return new PlanView(width, height, bays, gridLines, gridLabels, members, tributary, legend, lineLoads, drifts, pointLoads, marks, marker);
    }

    static PlanView of(Grid g, Level level, List<DerivedMember> members, DerivedMember selected,
                       OccupancyCatalogue cat, String memberHref, List<GridLineLoad> lineLoads) {
        return of(g, level, members, selected, cat, memberHref, lineLoads, List.of(), List.of(), MemberLabels.PLACES);
    }

    /** With the level's drift zones at roof steps and the building's point loads (those of this level are drawn). */
    static PlanView of(Grid g, Level level, List<DerivedMember> members, DerivedMember selected, OccupancyCatalogue cat,
                       String memberHref, List<GridLineLoad> lineLoads, List<DriftZones.Zone> driftZones, List<GridPointLoad> points,
                       MemberLabels marked) {
        Frame f = Frame.of(g, level);
        Palette palette = new Palette(cat);
        Map<String, String> legend = new LinkedHashMap<>();
        List<Shape> bays = new ArrayList<>();
        for (Bay b : level.bays()) {
            double x0 = g.x().position(b.col()), x1 = g.x().position(b.col() + 1);
            double y0 = g.y().position(b.row()), y1 = g.y().position(b.row() + 1);
            String name = g.bayName(b.col(), b.row());
            if (b.opening()) {
                bays.add(f.rect(x0, y0, x1, y1, "opening", "none", null, name + ": opening"));
                continue;
            }
            String use = cat.contains(b.occupancy()) ? cat.get(b.occupancy()).name() : b.occupancy();
            String fill = palette.fill(b.occupancy());
            legend.put(use, fill);
            bays.add(f.rect(x0, y0, x1, y1, "bay", fill, null, name + ": " + use));
            for (Map.Entry<Side, Double> c : b.cantilevers().entrySet()) {
                double d = c.getValue();
                switch (c.getKey()) {
                    case NORTH -> bays.add(f.rect(x0, y1, x1, y1 + d, "cantilever", fill, null, name + ": cantilever slab north"));
                    case SOUTH -> bays.add(f.rect(x0, y0 - d, x1, y0, "cantilever", fill, null, name + ": cantilever slab south"));
                    case EAST -> bays.add(f.rect(x1, y0, x1 + d, y1, "cantilever", fill, null, name + ": cantilever slab east"));
                    case WEST -> bays.add(f.rect(x0 - d, y0, x0, y1, "cantilever", fill, null, name + ": cantilever slab west"));
                }
            }
        }
        List<Shape> lines = new ArrayList<>(), labels = new ArrayList<>();
        for (int i = 0; i < g.x().lines(); i++) {
            double x = g.x().position(i);
            lines.add(f.line(x, f.minY, x, f.maxY, "grid", null, null));
            labels.add(f.label(x, f.maxY, 0, -18, g.x().name(i)));
        }
        for (int j = 0; j < g.y().lines(); j++) {
            double y = g.y().position(j);
            lines.add(f.line(f.minX, y, f.maxX, y, "grid", null, null));
            labels.add(f.label(f.minX, y, -18, 0, g.y().name(j)));
        }
        List<Shape> drawn = new ArrayList<>();
        List<Shape> marks = new ArrayList<>();
        for (DerivedMember m : members) {
            drawn.add(f.member(m, selected, memberHref.replace("{id}", m.id()), marked));
            marks.add(f.mark(m, marked));
        }
        List<Shape> trib = new ArrayList<>();
        if (selected != null) for (PlanRect r : selected.tributary()) trib.add(f.rect(r.x1(), r.y1(), r.x2(), r.y2(), "tributary", "none", null, "tributary area"));
        List<Shape> loads = new ArrayList<>();
        for (GridLineLoad l : lineLoads) if (l.level().equals(level.name())) loads.add(f.lineLoad(g, l));
        List<Shape> drifts = new ArrayList<>();
        for (DriftZones.Zone z : driftZones) {
            PlanRect r = z.area();
            drifts.add(f.rect(r.x1(), r.y1(), r.x2(), r.y2(), "drift", "none", null, z.label()));
        }
        List<Shape> pts = new ArrayList<>();
        for (GridPointLoad p : points) if (p.level().equals(level.name())) pts.add(f.point(g, p));
        return new PlanView(f.width(), f.height(), bays, lines, labels, drawn, trib, legend, loads, drifts, pts, marks);
    }

    /** Plan coordinates to screen coordinates: one scale, y flipped, a margin for the grid names. */
    private record Frame(double minX, double minY, double maxX, double maxY, double k) {
        static Frame of(Grid g, Level level) {
            double minX = 0, minY = 0, maxX = g.x().extent(), maxY = g.y().extent();
            for (Bay b : level.bays())
                for (Map.Entry<Side, Double> c : b.cantilevers().entrySet())
                    switch (c.getKey()) {
                        case NORTH -> maxY = Math.max(maxY, g.y().position(b.row() + 1) + c.getValue());
                        case SOUTH -> minY = Math.min(minY, g.y().position(b.row()) - c.getValue());
                        case EAST -> maxX = Math.max(maxX, g.x().position(b.col() + 1) + c.getValue());
                        case WEST -> minX = Math.min(minX, g.x().position(b.col()) - c.getValue());
                    }
            double k = Math.min((MAX_W - 2 * PAD) / (maxX - minX), (MAX_H - 2 * PAD) / (maxY - minY));
            return new Frame(minX, minY, maxX, maxY, k);
        }

        double sx(double x) { return round(PAD + (x - minX) * k); }

        double sy(double y) { return round(PAD + (maxY - y) * k); }

        double width() { return round(2 * PAD + (maxX - minX) * k); }

        double height() { return round(2 * PAD + (maxY - minY) * k); }

        Shape rect(double x1, double y1, double x2, double y2, String cls, String fill, String href, String title) {
            double l = sx(Math.min(x1, x2)), t = sy(Math.max(y1, y2));
            return new Shape(l, t, round(sx(Math.max(x1, x2)) - l), round(sy(Math.min(y1, y2)) - t), 0, 0, cls, fill, href, title);
        }

        Shape line(double x1, double y1, double x2, double y2, String cls, String href, String title) {
            return new Shape(sx(x1), sy(y1), 0, 0, sx(x2), sy(y2), cls, "none", href, title);
        }

        /** A thick line along the load's grid line from one bounding line to the other; its title is the label. */
        Shape lineLoad(Grid g, GridLineLoad l) {
            if (l.onXLine()) {
                double x = g.x().position(l.line());
                return line(x, g.y().position(l.from()), x, g.y().position(l.to()), "line-load", null, l.label());
            }
            double y = g.y().position(l.line());
            return line(g.x().position(l.from()), y, g.x().position(l.to()), y, "line-load", null, l.label());
        }

        /** A marker at the point load's place on plan; its title is the label and the loads. */
        Shape point(Grid g, GridPointLoad p) {
            double[] at = p.onPlan(g);
            return new Shape(sx(at[0]), sy(at[1]), 0, 0, 0, 0, "point-load", "none", null, p.label());
        }

        Shape label(double x, double y, double dx, double dy, String text) {
            return new Shape(round(sx(x) + dx), round(sy(y) + dy), 0, 0, 0, 0, "grid-name", "none", null, text);
        }

        /** The member's label printed beside it: at a beam's midpoint, to the upper right of a column. */
        Shape mark(DerivedMember m, MemberLabels labels) {
            PlanLine p = m.plan();
            boolean column = m.role() == MemberRole.COLUMN;
            double x = column ? sx(p.x1()) + 7 : (sx(p.x1()) + sx(p.x2())) / 2, y = column ? sy(p.y1()) - 7 : (sy(p.y1()) + sy(p.y2())) / 2 - 3;
            return new Shape(round(x), round(y), 0, 0, 0, 0, "mark", "none", null, labels.of(m));
        }

        Shape member(DerivedMember m, DerivedMember selected, String href, MemberLabels labels) {
            PlanLine p = m.plan();
            String cls = m.role().name().toLowerCase().replace('_', '-') + (selected != null && m.id().equals(selected.id()) ? " selected" : "");
            String title = labels.placed(m) + ", " + m.kind().title();
            if (m.role() == MemberRole.COLUMN)
                return new Shape(round(sx(p.x1()) - 5), round(sy(p.y1()) - 5), 10, 10, 0, 0, cls, "none", href, title);
            return line(p.x1(), p.y1(), p.x2(), p.y2(), cls, href, title);
        }

        private static double round(double v) { return Math.round(v * 10) / 10.0; }
    }
}
