package com.baysheet.framing;

import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.DriftStrip;
import com.baysheet.engine.snow.DriftSurcharge;
import com.baysheet.engine.snow.RoofSnow;
import com.baysheet.engine.snow.RoofStep;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.snow.StepDrift;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The roof steps of a lower roof found in the model (ASCE 7-16 7.7.1). A bay of a roof level is exposed where no
 * higher level has a floored bay over it; where an exposed bay's side borders a cell that a higher level covers, the
 * grid line between them is a wall, of height the highest covering level's elevation less this roof's. The upper
 * roof length ℓu is the run of covered cells straight away from the wall, the lower roof length ℓl the run of this
 * roof's exposed bays straight away from it (both in the direction across the wall, as the wind blows over the step).
 * Each wall is one bay side long; its drift acts over that length of wall and, past each free end of the wall, for
 * the drift width w along the wall's line (our choice, see {@link WallEnds}).
 */
final class RoofSteps {
    /**
     * One bay side of wall: along x at y = {@code at} (or along y at x = at), from {@code start} to {@code end}; the
     * lower roof lies toward increasing coordinate where {@code toward} is +1.
     */
    record Wall(boolean alongX, double at, double start, double end, int toward, RoofStep step, String line,
                String between, DriftSurcharge drift, List<Reach> reaches) {
        Wall { reaches = List.copyOf(reaches); }

        /** Distance from the wall into the lower roof of a coordinate across it. */
        double distance(double across) { return (across - at) * toward; }

        Wall withReaches(List<Reach> r) { return new Wall(alongX, at, start, end, toward, step, line, between, drift, r); }
    }

    /**
     * A rectangle of the lower roof the wall's drift profile loads: along the wall's line from {@code from} to
     * {@code to}, across from the wall's line to {@code depth} into the lower roof (the drift's extent there: w, or the
     * lower roof's {@code edge} where nearer); {@code edge} is the run of the lower roof's exposed bays from the wall's
     * line there, where the drift is cut off (ASCE 7-16 7.7.1): ℓl along the wall itself, and past an end of the wall
     * ({@code pastEnd}) the run at each cell beyond it.
     */
    record Reach(double from, double to, double depth, double edge, boolean pastEnd) {}

    static final RoofSteps NONE = new RoofSteps(List.of());

    final List<Wall> walls;

    private RoofSteps(List<Wall> walls) { this.walls = List.copyOf(walls); }

    /** The walls beside this level, where it is a roof of a snow project lower than another level; else none. */
    static RoofSteps of(CalcContext ctx, LevelPlan plan, List<Level> all) {
        Level low = plan.level;
        if (!reads(ctx, plan)) return NONE;
        Grid g = plan.grid;
        int nx = plan.xCells(), ny = plan.yCells();
        double[][] top = SkyExposure.cover(plan, all);
        SnowRoof roof = low.surface().roof(low.roofSlope());
        boolean[][] exposed = SkyExposure.exposed(plan, top);
        List<WallEnds.Placed> out = new ArrayList<>();
        int[][] sides = {{0, 1}, {0, -1}, {1, 0}, {-1, 0}};
        for (int c = 0; c < nx; c++)
            for (int r = 0; r < ny; r++) {
                if (plan.floored(c, r) == null || !Double.isNaN(top[c][r])) continue;
                for (int[] s : sides) {
                    int nc = c + s[0], nr = r + s[1];
                    if (nc < 0 || nr < 0 || nc >= nx || nr >= ny || Double.isNaN(top[nc][nr])) continue;
                    double upper = 0, lower = 0;
                    for (int k = 0; ; k++) {
                        int cc = nc + k * s[0], rr = nr + k * s[1];
                        if (cc < 0 || rr < 0 || cc >= nx || rr >= ny || Double.isNaN(top[cc][rr])) break;
                        upper += s[0] != 0 ? g.x().spacing(cc) : g.y().spacing(rr);
                    }
                    for (int k = 0; ; k++) {
                        int cc = c - k * s[0], rr = r - k * s[1];
                        if (cc < 0 || rr < 0 || cc >= nx || rr >= ny || plan.floored(cc, rr) == null || !Double.isNaN(top[cc][rr])) break;
                        lower += s[0] != 0 ? g.x().spacing(cc) : g.y().spacing(rr);
                    }
                    RoofStep step = new RoofStep(top[nc][nr] - low.elevation(), upper, lower);
                    DriftSurcharge d = RoofSnow.calculate(ctx, ctx.snow(), roof.withStep(step),
                            RecordBuilder.numbersOnly("step", ctx.edition().id(), ctx.system())).drift();
                    if (!d.required()) continue;
                    boolean alongX = s[1] != 0;
                    int wallLine = alongX ? (s[1] > 0 ? r + 1 : r) : (s[0] > 0 ? c + 1 : c);
                    double at = alongX ? plan.y(wallLine) : plan.x(wallLine);
                    double start = alongX ? plan.x(c) : plan.y(r), end = alongX ? plan.x(c + 1) : plan.y(r + 1);
                    String line = alongX ? g.y().name(wallLine) : g.x().name(wallLine);
                    String between = alongX ? g.x().name(c) + "-" + g.x().name(c + 1) : g.y().name(r) + "-" + g.y().name(r + 1);
                    out.add(new WallEnds.Placed(c, r, s[0], s[1],
                            new Wall(alongX, at, start, end, -(s[0] + s[1]), step, line, between, d, List.of())));
                }
            }
        return new RoofSteps(WallEnds.reaches(plan, exposed, out));
    }

    /** Whether {@link #of} looks at the other levels for this level at all (else it has no steps whatever they are). */
    static boolean reads(CalcContext ctx, LevelPlan plan) {
        return plan.level.roof() && ctx.snow() != null && plan.belowAnother;
    }

    boolean isEmpty() { return walls.isEmpty(); }

    /**
     * The drifts reaching a member on {@code line} with loaded strips {@code rects} (the strips in the member's own
     * order; x along the member from the line's first point). Walls of the same step (one line, one height and
     * roof lengths) are one entry.
     */
    List<StepDrift> on(PlanLine member, List<PlanRect> rects, CalcContext ctx) {
        Map<String, List<DriftStrip>> strips = new LinkedHashMap<>();
        Map<String, Wall> first = new LinkedHashMap<>();
        Map<String, List<String>> spans = new LinkedHashMap<>();
        Set<String> pastEnds = new HashSet<>();
        boolean memberAlongX = member.y1() == member.y2();
        for (Wall w : walls)
            for (Reach reach : w.reaches)
                for (PlanRect r : rects) {
                    DriftStrip s = strip(w, reach, member, memberAlongX, r);
                    if (s == null) continue;
                    String key = (w.alongX ? "x" : "y") + w.at + "/" + w.toward + "/" + w.step;
                    strips.computeIfAbsent(key, k -> new ArrayList<>()).add(s);
                    first.putIfAbsent(key, w);
                    if (reach.pastEnd()) pastEnds.add(key);
                    List<String> b = spans.computeIfAbsent(key, k -> new ArrayList<>());
                    if (!b.contains(w.between)) b.add(w.between);
                }
        List<StepDrift> out = new ArrayList<>();
        for (var e : strips.entrySet()) {
            Wall w = first.get(e.getKey());
            String where = "wall on grid line " + w.line + " (" + String.join(", ", spans.get(e.getKey())) + "), "
                    + show(w.step.height(), ctx) + " from this roof up to the higher level; upper roof length ℓu "
                    + show(w.step.upperLength(), ctx) + ", lower roof length ℓl " + show(w.step.lowerLength(), ctx);
            out.add(new StepDrift(w.step, where, e.getValue(), pastEnds.contains(e.getKey())));
        }
        return out;
    }

    /** The part of strip {@code r} within the reach of the wall's drift, or null where the drift does not reach it. */
    private static DriftStrip strip(Wall w, Reach reach, PlanLine m, boolean memberAlongX, PlanRect r) {
        double rs = w.alongX ? Math.min(r.x1(), r.x2()) : Math.min(r.y1(), r.y2());   // along the wall
        double re = w.alongX ? Math.max(r.x1(), r.x2()) : Math.max(r.y1(), r.y2());
        double ca = w.alongX ? r.y1() : r.x1(), cb = w.alongX ? r.y2() : r.x2();      // across the wall
        double lo = Math.max(rs, reach.from()), hi = Math.min(re, reach.to());
        if (hi <= lo) return null;
        double da = w.distance(ca), db = w.distance(cb);
        double near = Math.max(0, Math.min(da, db)), far = Math.min(reach.depth(), Math.max(da, db));
        if (far <= near) return null;
        double mStart = memberAlongX ? m.x1() : m.y1();
        double length = Math.abs((memberAlongX ? m.x2() : m.y2()) - mStart);
        if (memberAlongX == w.alongX)
            return new DriftStrip(true, onMember(lo - mStart, length), onMember(hi - mStart, length), far - near, near, near, reach.edge());
        double a = w.at + w.toward * near, b = w.at + w.toward * far;   // the stretch of the member within the reach
        double from = onMember(Math.min(a, b) - mStart, length), to = onMember(Math.max(a, b) - mStart, length);
        if (to <= from) return null;
        return new DriftStrip(false, from, to, hi - lo, w.toward > 0 ? near : far, w.toward > 0 ? far : near, reach.edge());
    }

    /**
     * A position along the member, measured from its start, with the rounding of plan coordinates taken off at its
     * ends: a strip that starts where the member starts must not start 4e-16 ft before it.
     */
    static double onMember(double x, double length) {
        double tolerance = 1e-9 * Math.max(1, length);
        if (Math.abs(x) <= tolerance) return 0;
        if (Math.abs(x - length) <= tolerance) return length;
        return x;
    }

    private static String show(double v, CalcContext ctx) { return Display.of(v, Quantity.LENGTH, ctx.system()); }
}
