package com.baysheet.framing;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.GridPointLoad;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.SelfWeights;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

/**
 * A building derived again after one edit, reusing what an earlier derivation of it kept, equals the building
 * derived from nothing: every member (every field, its record as text) and every take-down (every row, its record
 * as text), and a refused model is refused with the same message. Random models (with roofs below other levels in a
 * snow project, line and point loads, self weights by role and for single members), random edits one after another.
 */
class RederivationProperties {
    /** The edits drawn: a bay's occupancy, dead load, framing or opening, a level's elevation, loads, self weights, grid, snow. */
    static final int EDITS = 12;

    @Property(tries = 80)
    void aRederivedBuildingEqualsItsFullDerivation(@ForAll long seed, @ForAll @IntRange(min = 1, max = 3) int edits) {
        Random rnd = new Random(seed);
        Building b = model(rnd, seed);
        Rederivation again = new Rederivation();
        Rederivations.Outcome first = Rederivations.Outcome.of(() -> again.derive(b));
        Rederivations.assertSame(first, Rederivations.Outcome.of(() -> Rederivations.full(b)), "seed " + seed + ", first");
        Building now = b;
        for (int e = 0; e < edits; e++) {
            int kind = rnd.nextInt(EDITS);
            Building next = edit(now, kind, rnd);
            Rederivations.assertSame(Rederivations.Outcome.of(() -> again.derive(next)), Rederivations.Outcome.of(() -> Rederivations.full(next)),
                    "seed " + seed + ", edit " + e + " of kind " + kind);
            now = next;
        }
    }

    /** A random model keyed as the store keys it, sometimes in a snow project with lower roofs, with loads and weights. */
    static Building model(Random rnd, long seed) {
        Building plain = Buildings.random(seed);
        List<Level> levels = new ArrayList<>();
        for (int k = 0; k < plain.levels().size(); k++) {
            Level l = plain.levels().get(k);
            // a lower roof now and then, so that roofs step down from the levels above them
            if (!l.roof() && rnd.nextDouble() < 0.3) l = new Level(l.name(), l.elevation(), true, 0.25, roofBays(l.bays()));
            levels.add(l.withKey("L" + (100 + k)));
        }
        Building b = new Building(plain.name(), plain.context(), plain.grid(), levels);
        if (rnd.nextBoolean()) b = new Building(b.name(), b.context().withSnow(SnowTakeDownProperties.site(20 + rnd.nextInt(40))), b.grid(), b.levels());
        b = b.withSelfWeights(new SelfWeights(rnd.nextInt(20), rnd.nextInt(30), rnd.nextInt(50), rnd.nextInt(80), "firm default"));
        List<GridPointLoad> points = new ArrayList<>();
        List<GridLineLoad> lines = new ArrayList<>();
        for (int n = rnd.nextInt(3); n > 0; n--) points.add(pointLoad(b, rnd, "unit " + n));
        for (int n = rnd.nextInt(3); n > 0; n--) lines.add(lineLoad(b, rnd, "wall " + n));
        return b.withPointLoads(points).withLineLoads(lines);
    }

    static Building edit(Building b, int kind, Random rnd) {
        Level l = b.levels().get(rnd.nextInt(b.levels().size()));
        List<Bay> floored = l.bays().stream().filter(x -> !x.opening()).toList();
        Bay bay = floored.isEmpty() ? null : floored.get(rnd.nextInt(floored.size()));
        return switch (kind) {
            case 0 -> bay == null || l.roof() ? b : withBay(b, l, bay, new Bay(bay.col(), bay.row(),
                    Buildings.FLOOR_USES.get(rnd.nextInt(Buildings.FLOOR_USES.size())), bay.deadLoad(), bay.framing(), false,
                    bay.cantilevers(), bay.cantileverOccupancy()));
            case 1 -> bay == null ? b : withBay(b, l, bay, new Bay(bay.col(), bay.row(), bay.occupancy(), bay.deadLoad() + 1 + rnd.nextInt(30),
                    bay.framing(), false, bay.cantilevers(), bay.cantileverOccupancy()));
            case 2 -> bay == null ? b : withBay(b, l, bay, new Bay(bay.col(), bay.row(), bay.occupancy(), bay.deadLoad(),
                    new Framing(rnd.nextBoolean() ? Direction.X : Direction.Y, rnd.nextInt(4)), false, bay.cantilevers(), bay.cantileverOccupancy()));
            case 3 -> withLevel(b, l, new Level(l.name(), l.elevation() + (rnd.nextBoolean() ? 1 : -1) * (1 + rnd.nextInt(15)), l.roof(),
                    l.roofSlope(), l.bays(), l.key(), l.surface()));
            case 4 -> b.withPointLoads(plus(b.pointLoads(), pointLoad(b, rnd, "added " + rnd.nextInt(1000))));
            case 5 -> b.withLineLoads(plus(b.lineLoads(), lineLoad(b, rnd, "added " + rnd.nextInt(1000))));
            case 6 -> b.withPointLoads(b.pointLoads().isEmpty() ? b.pointLoads() : b.pointLoads().subList(1, b.pointLoads().size()));
            case 7 -> {  // a weight entered for one member of the building
                Derived d;
                try {
                    d = Derivation.derive(b.withSelfWeights(SelfWeights.NONE));
                } catch (com.baysheet.engine.InputError refused) {
                    yield b;
                }
                Map<String, Double> own = new HashMap<>(b.selfWeights().members());
                own.put(d.members().get(rnd.nextInt(d.members().size())).id(), 5.0 + rnd.nextInt(200));
                yield b.withSelfWeights(b.selfWeights().withMembers(own));
            }
            case 8 -> { // a self weight by role: every level reads it
                SelfWeights w = b.selfWeights();
                yield b.withSelfWeights(new SelfWeights(w.infillBeam(), w.gridBeam(), w.girder() + 1 + rnd.nextInt(20), w.column(), w.origin(), w.members()));
            }
            case 9 -> { // a grid spacing: every level reads it
                GridAxis x = b.grid().x();
                List<Double> s = new ArrayList<>(x.spacings());
                int i = rnd.nextInt(s.size());
                s.set(i, s.get(i) + 0.5 + rnd.nextInt(6));
                yield new Building(b.name(), b.context(), new Grid(new GridAxis("x", x.names(), s, x.ids()), b.grid().y()), b.levels(),
                        b.selfWeights(), b.lineLoads(), b.pointLoads());
            }
            case 10 -> { // a bay made an opening (the cover over the roofs below changes), or an opening floored
                Bay any = l.bays().get(rnd.nextInt(l.bays().size()));
                if (any.opening()) yield withBay(b, l, any, Bay.floor(any.col(), any.row(), l.roof() ? "roof-ordinary" : "office", 50,
                        new Framing(Direction.X, 1)));
                yield floored.size() < 2 ? b : withBay(b, l, any, Bay.opening(any.col(), any.row()));
            }
            default -> { // the snow site
                var ctx = b.context();
                var snow = ctx.snow() == null ? SnowTakeDownProperties.site(30) : null;
                yield new Building(b.name(), ctx.withSnow(snow), b.grid(), b.levels(), b.selfWeights(), b.lineLoads(), b.pointLoads());
            }
        };
    }

    static Building withBay(Building b, Level l, Bay was, Bay now) {
        List<Bay> bays = new ArrayList<>(l.bays());
        bays.set(bays.indexOf(was), now);
        return withLevel(b, l, new Level(l.name(), l.elevation(), l.roof(), l.roofSlope(), bays, l.key(), l.surface()));
    }

    static Building withLevel(Building b, Level was, Level now) {
        List<Level> levels = new ArrayList<>(b.levels());
        levels.set(levels.indexOf(was), now);
        return new Building(b.name(), b.context(), b.grid(), levels, b.selfWeights(), b.lineLoads(), b.pointLoads());
    }

    private static List<Bay> roofBays(List<Bay> bays) {
        List<Bay> out = new ArrayList<>();
        for (Bay x : bays)
            out.add(x.opening() ? x : new Bay(x.col(), x.row(), "roof-ordinary", x.deadLoad(), x.framing(), false, x.cantilevers(), null));
        return out;
    }

    /** A point load in a random floored bay of a random level. */
    private static GridPointLoad pointLoad(Building b, Random rnd, String label) {
        Level l = b.levels().get(rnd.nextInt(b.levels().size()));
        Bay bay = floored(l, rnd);
        double wx = b.grid().x().spacing(bay.col()), wy = b.grid().y().spacing(bay.row());
        return GridPointLoad.inBay(l.name(), label, bay.col(), bay.row(), wx * rnd.nextDouble(), wy * rnd.nextDouble(),
                100 + rnd.nextInt(4000), rnd.nextBoolean() ? rnd.nextInt(2000) : 0, "office");
    }

    /** A line load along one side of a random floored bay of a random level. */
    private static GridLineLoad lineLoad(Building b, Random rnd, String label) {
        Level l = b.levels().get(rnd.nextInt(b.levels().size()));
        Bay bay = floored(l, rnd);
        boolean onX = rnd.nextBoolean();
        int line = onX ? bay.col() + rnd.nextInt(2) : bay.row() + rnd.nextInt(2), from = onX ? bay.row() : bay.col();
        return new GridLineLoad(l.name(), onX, line, from, from + 1, label, 50 + rnd.nextInt(500),
                rnd.nextBoolean() ? 100 : 0, "office", false);
    }

    private static Bay floored(Level l, Random rnd) {
        List<Bay> floored = l.bays().stream().filter(x -> !x.opening()).toList();
        return floored.get(rnd.nextInt(floored.size()));
    }

    private static <T> List<T> plus(List<T> list, T one) {
        List<T> out = new ArrayList<>(list);
        out.add(one);
        return out;
    }
}
