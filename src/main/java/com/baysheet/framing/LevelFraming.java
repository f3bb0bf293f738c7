package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.SnowOnRoof;
import com.baysheet.engine.load.Support;
import com.baysheet.framing.model.Level;
import com.baysheet.engine.member.EndShare;
import com.baysheet.engine.member.MemberResult;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.GridPointLoad;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.framing.model.SelfWeights;
import com.baysheet.framing.model.Side;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * One level's beams and girders, by the half-way rule: infill beams carry a strip one beam spacing wide;
 * grid-line members parallel to the infill beams carry half a spacing (plus any cantilever slab past the
 * edge); girders, the grid-line members across the beams, carry the beams' unreduced reactions as point
 * loads. The members' end shares are handed to the columns at the grid points.
 */
final class LevelFraming {
    final List<DerivedMember> members = new ArrayList<>();
    /** Each member's result under the cache's neutral subject, in the order of {@link #members}. */
    final List<MemberResult> neutrals = new ArrayList<>();
    /** End shares arriving at each grid point, indexed [x line][y line]. */
    final List<EndShare>[][] atPoint;
    /** {@link #members} once framed, as the one list every derivation reusing this framing holds ({@link Derived#parts}). */
    private volatile List<DerivedMember> part;
    private final MemberCache cache;
    private final LevelPlan plan;
    private final Segment[][] alongX, alongY;
    private final SelfWeights weights;
    private final List<GridLineLoad> lineLoads;
    private final RoofSteps steps;
    private final List<GridPointLoad> pointLoads;
    /** A floor level's bays that no higher level covers (see {@link SkyExposure#openFloorBays}); none for a roof. */
    private final SkyExposure.Open open;

    @SuppressWarnings("unchecked")
    LevelFraming(MemberCache cache, LevelPlan plan) {
        this(cache, plan, SelfWeights.NONE, List.of(), RoofSteps.NONE, List.of(), SkyExposure.Open.NONE);
    }

    LevelFraming(MemberCache cache, LevelPlan plan, SelfWeights weights, List<GridLineLoad> lineLoads, RoofSteps steps,
                 List<GridPointLoad> pointLoads, SkyExposure.Open open) {
        this.open = open;
        this.steps = steps;
        this.pointLoads = pointLoads;
        this.cache = cache;
        this.plan = plan;
        this.weights = weights;
        this.lineLoads = lineLoads;
        int nx = plan.xCells(), ny = plan.yCells();
        atPoint = new List[nx + 1][ny + 1];
        alongX = new Segment[nx][ny + 1];
        alongY = new Segment[nx + 1][ny];
        for (int i = 0; i < nx; i++) for (int j = 0; j <= ny; j++) alongX[i][j] = new Segment(true, i, j, plan.x(i + 1) - plan.x(i));
        for (int i = 0; i <= nx; i++) for (int j = 0; j < ny; j++) alongY[i][j] = new Segment(false, i, j, plan.y(j + 1) - plan.y(j));
    }

    /** A level framed as another of the same shape was ({@link TypicalFloor}): its end shares, members to be added. */
    LevelFraming(LevelPlan plan, List<EndShare>[][] atPoint) {
        this.atPoint = atPoint;
        this.plan = plan;
        this.cache = null;
        this.alongX = this.alongY = null;
        this.weights = SelfWeights.NONE;
        this.lineLoads = List.of();
        this.pointLoads = List.of();
        this.steps = RoofSteps.NONE;
        this.open = SkyExposure.Open.NONE;
    }

    List<DerivedMember> part() {
        if (part == null) synchronized (this) { if (part == null) part = List.copyOf(members); }
        return part;
    }

    LevelFraming derive() {
        for (GridPointLoad p : pointLoads) PointLoads.check(plan, p, cache.context().catalogue());
        for (int c = 0; c < plan.xCells(); c++)
            for (int r = 0; r < plan.yCells(); r++) {
                Bay b = plan.floored(c, r);
                if (b != null) bay(b);
            }
        for (GridLineLoad l : lineLoads) LineLoads.place(plan, l, alongX, alongY, cache.context().catalogue());
        for (GridPointLoad p : pointLoads) if (!p.inBay()) PointLoads.onLine(plan, p, alongX, alongY);
        for (Segment[] row : alongX) for (Segment s : row) if (s.loaded()) gridMember(s);
        for (Segment[] row : alongY) for (Segment s : row) if (s.loaded()) gridMember(s);
        return this;
    }

    private void bay(Bay b) {
        int c = b.col(), r = b.row();
        double x0 = plan.x(c), x1 = plan.x(c + 1), y0 = plan.y(r), y1 = plan.y(r + 1);
        String name = plan.bayName(c, r);
        boolean beamsAlongX = b.framing().beams() == Direction.X;
        int n = b.framing().infillBeams();
        double beamLength = beamsAlongX ? x1 - x0 : y1 - y0;
        double s = (beamsAlongX ? y1 - y0 : x1 - x0) / (n + 1);
        // grid-line members parallel to the beams: half a spacing each
        Segment lo = beamsAlongX ? alongX[c][r] : alongY[c][r];
        Segment hi = beamsAlongX ? alongX[c][r + 1] : alongY[c + 1][r];
        Map<Integer, List<PointLoad>> points = PointLoads.inBay(plan, b, pointLoads, cache.context().system());
        lo.applied.addAll(points.getOrDefault(0, List.of()));
        hi.applied.addAll(points.getOrDefault(n + 1, List.of()));
        lo.strip(b.occupancy(), s / 2, b.deadLoad(), beamsAlongX ? new PlanRect(x0, y0, x1, y0 + s / 2) : new PlanRect(x0, y0, x0 + s / 2, y1), name);
        hi.strip(b.occupancy(), s / 2, b.deadLoad(), beamsAlongX ? new PlanRect(x0, y1 - s / 2, x1, y1) : new PlanRect(x1 - s / 2, y0, x1, y1), name);
        Segment startGirder = beamsAlongX ? alongY[c][r] : alongX[c][r];
        Segment endGirder = beamsAlongX ? alongY[c + 1][r] : alongX[c][r + 1];
        for (int k = 1; k <= n; k++) {
            double t = k * s;
            PlanLine line = beamsAlongX ? new PlanLine(x0, y0 + t, x1, y0 + t) : new PlanLine(x0 + t, y0, x0 + t, y1);
            PlanRect trib = beamsAlongX ? new PlanRect(x0, y0 + t - s / 2, x1, y0 + t + s / 2) : new PlanRect(x0 + t - s / 2, y0, x0 + t + s / 2, y1);
            String id = plan.id + "-bay" + plan.at(c, r) + "-b" + k;
            String title = "Beam " + name + " #" + k;
            MemberResult res = calc(id, title, MemberKind.INTERIOR_BEAM, beamLength, List.of(new AreaStrip(b.occupancy(), s, 0, beamLength, b.deadLoad())),
                    line, trib, points.getOrDefault(k, List.of()), name);
            members.add(new DerivedMember(id, title, plan.level.name(), MemberRole.INFILL_BEAM, MemberKind.INTERIOR_BEAM, line,
                    beamLength, s, Map.of(b.occupancy(), s * beamLength), s * beamLength, List.of(name), List.of(trib), res));
            PlanRect startHalf = beamsAlongX ? new PlanRect(x0, y0 + t - s / 2, (x0 + x1) / 2, y0 + t + s / 2) : new PlanRect(x0 + t - s / 2, y0, x0 + t + s / 2, (y0 + y1) / 2);
            PlanRect endHalf = beamsAlongX ? new PlanRect((x0 + x1) / 2, y0 + t - s / 2, x1, y0 + t + s / 2) : new PlanRect(x0 + t - s / 2, (y0 + y1) / 2, x0 + t + s / 2, y1);
            startGirder.point(res.left().at(t), startHalf, name);
            endGirder.point(res.right().at(t), endHalf, name);
        }
        for (Map.Entry<Side, Double> e : b.cantilevers().entrySet()) cantilever(b, e.getKey(), e.getValue(), name, x0, x1, y0, y1);
    }

    private void cantilever(Bay b, Side side, double len, String name, double x0, double x1, double y0, double y1) {
        Segment seg;
        PlanRect rect;
        switch (side) {
            case SOUTH -> { seg = alongX[b.col()][b.row()]; rect = new PlanRect(x0, y0 - len, x1, y0); }
            case NORTH -> { seg = alongX[b.col()][b.row() + 1]; rect = new PlanRect(x0, y1, x1, y1 + len); }
            case WEST -> { seg = alongY[b.col()][b.row()]; rect = new PlanRect(x0 - len, y0, x0, y1); }
            default -> { seg = alongY[b.col() + 1][b.row()]; rect = new PlanRect(x1, y0, x1 + len, y1); }
        }
        // the slab past the edge carries its own occupancy: by default the balcony of the bay's (Table 4.3-1)
        seg.strip(b.cantileverUse(cache.context().catalogue()), len, b.deadLoad(), rect, name);
        seg.cantilever = true;
    }

    private void gridMember(Segment s) {
        int i = s.i, j = s.j;
        Bay one = s.alongX ? plan.floored(i, j - 1) : plan.floored(i - 1, j);
        Bay two = s.alongX ? plan.floored(i, j) : plan.floored(i, j);
        boolean edge = one == null || two == null;
        MemberKind kind = !edge ? MemberKind.INTERIOR_BEAM : s.cantilever ? MemberKind.EDGE_BEAM_CANTILEVER : MemberKind.EDGE_BEAM;
        boolean girder = !s.points.isEmpty();
        String line = s.alongX ? plan.grid.y().name(j) : plan.grid.x().name(i);
        String between = s.alongX ? plan.grid.x().name(i) + "-" + plan.grid.x().name(i + 1)
                : plan.grid.y().name(j) + "-" + plan.grid.y().name(j + 1);
        String title = (girder ? "Girder " : "Beam ") + line + "/" + between;
        String id = plan.id + (s.alongX ? "-h" : "-v") + plan.at(i, j);
        List<PointLoad> carried = new ArrayList<>(s.points);
        carried.addAll(s.applied);
        PlanLine pl = s.alongX ? new PlanLine(plan.x(i), plan.y(j), plan.x(i + 1), plan.y(j))
                : new PlanLine(plan.x(i), plan.y(j), plan.x(i), plan.y(j + 1));
        // one input, built under the cache's neutral subject (each copy of an input copies its lists)
        MemberInput in = new MemberInput(MemberCache.NEUTRAL, kind, new Support.Simple(s.length), 1, s.strips, List.of(), carried,
                weights.of(id, girder ? weights.girder() : weights.gridBeam()), roofSlope(), Double.NaN, plan.level.roof(), List.of(),
                weights.originOf(id, girder ? "girders" : "grid beams"), 0, s.lineLoads, snow(pl, s.stripRects), openAmong(s.bays));
        MemberResult neutral = cache.neutral(in), res = neutral.withSubject(title + ", " + plan.level.name());
        neutrals.add(neutral);
        Map<String, Double> areas = new java.util.LinkedHashMap<>();
        for (AreaStrip st : s.strips) areas.merge(st.occupancy(), st.area(), Double::sum);
        for (var p : s.points) for (var a : p.areas()) areas.merge(a.occupancy(), a.area(), Double::sum);
        double width = s.length > 0 ? s.direct / s.length : 0;
        members.add(new DerivedMember(id, title, plan.level.name(), girder ? MemberRole.GIRDER : MemberRole.GRID_BEAM, kind, pl,
                s.length, girder ? 0 : width, areas, s.direct, s.bays, s.outline, res));
        arrive(i, j, res.left());
        if (s.alongX) arrive(i + 1, j, res.right());
        else arrive(i, j + 1, res.right());
    }

    private MemberResult calc(String id, String title, MemberKind kind, double span, List<AreaStrip> strips, PlanLine line, PlanRect trib,
                              List<PointLoad> applied, String bay) {
        MemberInput in = new MemberInput(MemberCache.NEUTRAL, kind, new Support.Simple(span), 1, strips, List.of(), applied,
                weights.of(id, weights.infillBeam()), roofSlope(), Double.NaN, plan.level.roof(), List.of(),
                weights.originOf(id, "infill beams"), 0, List.of(), snow(line, List.of(trib)), open.among(bay));
        MemberResult neutral = cache.neutral(in);
        neutrals.add(neutral);
        return neutral.withSubject(title + ", " + plan.level.name());
    }

    /** This floor level's open bays as the records name them, where any of a member's tributary bays is one. */
    List<String> openAmong(List<String> bays) { return open.among(bays); }

    /**
     * A roof level's snow on a member's strips (the snow site itself is the project's, in the context), with the
     * drifts of the roof steps that reach the strips.
     */
    private SnowOnRoof snow(PlanLine line, List<PlanRect> rects) {
        Level l = plan.level;
        if (!l.roof()) return null;
        return new SnowOnRoof(l.surface().roof(l.roofSlope()), plan.belowAnother,
                steps.isEmpty() ? List.of() : steps.on(line, rects, cache.context()));
    }

    private double roofSlope() { return plan.level.roofSlope(); }

    private void arrive(int i, int j, EndShare share) {
        if (atPoint[i][j] == null) atPoint[i][j] = new ArrayList<>();
        atPoint[i][j].add(share);
    }
}
