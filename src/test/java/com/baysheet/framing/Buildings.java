package com.baysheet.framing;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.BiFunction;

/** Builders shared by the framing tests, so that each test states only what it varies. */
final class Buildings {
    private Buildings() {}

    static final CalcContext US = CalcContext.of(UnitSystem.US);

    /** Floor occupancies the random models draw from: ordinary, corridor, retail, assembly, heavy storage, garage. */
    static final List<String> FLOOR_USES = List.of("office", "office-corridor", "retail-upper", "retail-first",
            "assembly-movable-seats", "storage-heavy", "storage-light", "garage-passenger", "school-classroom");

    /** An axis with lines named prefix + 1.. at the given spacings. */
    static GridAxis axis(String axis, String prefix, double... spacings) {
        List<String> names = new ArrayList<>();
        List<Double> s = new ArrayList<>();
        for (int i = 0; i <= spacings.length; i++) names.add(prefix + (i + 1));
        for (double d : spacings) s.add(d);
        return new GridAxis(axis, names, s);
    }

    static Grid grid(double[] xs, double[] ys) {
        return new Grid(axis("x", "", xs), axis("y", "Y", ys));
    }

    /** Every cell of the grid as a bay made by {@code bay}. */
    static List<Bay> everyBay(Grid g, BiFunction<Integer, Integer, Bay> bay) {
        List<Bay> out = new ArrayList<>();
        for (int c = 0; c < g.x().cells(); c++)
            for (int r = 0; r < g.y().cells(); r++) out.add(bay.apply(c, r));
        return out;
    }

    /** {@code floors} identical floor levels of one occupancy, 12 ft apart, named F1 (lowest) up. */
    static List<Level> floors(Grid g, int floors, String occupancy, double dead, Framing framing) {
        List<Level> out = new ArrayList<>();
        for (int k = 1; k <= floors; k++)
            out.add(Level.floor("F" + k, 12.0 * k, everyBay(g, (c, r) -> Bay.floor(c, r, occupancy, dead, framing))));
        return out;
    }

    static Building building(Grid g, List<Level> levels) {
        return new Building("test", US, g, levels);
    }

    /** The same building mirrored about a north-south line: x spacings reversed, columns and east/west swapped. */
    static Building mirrorX(Building b) {
        GridAxis x = b.grid().x();
        List<Double> s = new ArrayList<>(x.spacings());
        java.util.Collections.reverse(s);
        Grid g = new Grid(new GridAxis("x", x.names(), s), b.grid().y());
        int nx = x.cells();
        List<Level> levels = new ArrayList<>();
        for (Level l : b.levels()) {
            List<Bay> bays = new ArrayList<>();
            for (Bay bay : l.bays()) {
                Map<Side, Double> cant = new EnumMap<>(Side.class);
                bay.cantilevers().forEach((side, len) -> cant.put(side == Side.EAST ? Side.WEST : side == Side.WEST ? Side.EAST : side, len));
                bays.add(new Bay(nx - 1 - bay.col(), bay.row(), bay.occupancy(), bay.deadLoad(), bay.framing(), bay.opening(), cant,
                        bay.cantileverOccupancy()));
            }
            levels.add(new Level(l.name(), l.elevation(), l.roof(), l.roofSlope(), bays));
        }
        return new Building(b.name(), b.context(), g, levels);
    }

    /** Floored plan area of a level: its bays and their cantilever slabs (ft²). */
    static double flooredArea(Grid g, Level l) {
        double a = 0;
        for (Bay b : l.bays()) {
            if (b.opening()) continue;
            double w = g.x().spacing(b.col()), d = g.y().spacing(b.row());
            a += w * d;
            for (Map.Entry<Side, Double> c : b.cantilevers().entrySet())
                a += c.getValue() * (c.getKey() == Side.NORTH || c.getKey() == Side.SOUTH ? w : d);
        }
        return a;
    }

    /** Floored plan area of a level by occupancy id (ft²); cantilever slabs by their own occupancy. */
    static Map<String, Double> areaByUse(Grid g, Level l) {
        Map<String, Double> out = new HashMap<>();
        for (Bay b : l.bays()) {
            if (b.opening()) continue;
            double w = g.x().spacing(b.col()), d = g.y().spacing(b.row());
            out.merge(b.occupancy(), w * d, Double::sum);
            for (Map.Entry<Side, Double> c : b.cantilevers().entrySet())
                out.merge(cantileverUse(b), c.getValue() * (c.getKey() == Side.NORTH || c.getKey() == Side.SOUTH ? w : d), Double::sum);
        }
        return out;
    }

    /**
     * The occupancy a bay's cantilever slabs carry, stated apart from the code under test: the one given, else the
     * balcony serving the bay's occupancy (ASCE 7-16 Table 4.3-1), except on a roof row, whose overhang stays roof.
     */
    static String cantileverUse(Bay b) {
        if (b.cantileverOccupancy() != null) return b.cantileverOccupancy();
        return US.catalogue().get(b.occupancy()).isRoof() ? b.occupancy() : "balcony:" + b.occupancy();
    }

    /**
     * A random model from a seed: 1 to 4 bays each way at unequal spacings, 1 to 4 levels (the top one a
     * sloped roof half the time), mixed occupancies, both framing directions with 0 to 4 infill beams,
     * openings, cells left unframed on some levels, and cantilever slabs on true edges of the grid (by default
 * balconies, now and then given a floor occupancy of their own).
     */
    static Building random(long seed) {
        Random rnd = new Random(seed);
        double[] xs = spacings(rnd, 1 + rnd.nextInt(4)), ys = spacings(rnd, 1 + rnd.nextInt(4));
        Grid g = grid(xs, ys);
        int nLevels = 1 + rnd.nextInt(4);
        boolean roofOnTop = rnd.nextBoolean();
        List<Level> levels = new ArrayList<>();
        for (int k = 1; k <= nLevels; k++) {
            boolean roof = roofOnTop && k == nLevels;
            String main = FLOOR_USES.get(rnd.nextInt(FLOOR_USES.size()));
            List<Bay> bays = new ArrayList<>();
            for (int c = 0; c < xs.length; c++)
                for (int r = 0; r < ys.length; r++) {
                    double p = rnd.nextDouble();
                    if (p < 0.08) continue;                                  // not framed at this level
                    if (p < 0.18) { bays.add(Bay.opening(c, r)); continue; }
                    String use = roof ? "roof-ordinary" : rnd.nextDouble() < 0.7 ? main : FLOOR_USES.get(rnd.nextInt(FLOOR_USES.size()));
                    Framing f = new Framing(rnd.nextBoolean() ? Direction.X : Direction.Y, rnd.nextInt(5));
                    Bay b = Bay.floor(c, r, use, 10 + rnd.nextInt(100), f);
                    if (c == 0 && rnd.nextDouble() < 0.3) b = b.withCantilever(Side.WEST, 2 + rnd.nextInt(7));
                    if (c == xs.length - 1 && rnd.nextDouble() < 0.3) b = b.withCantilever(Side.EAST, 2 + rnd.nextInt(7));
                    if (r == 0 && rnd.nextDouble() < 0.3) b = b.withCantilever(Side.SOUTH, 2 + rnd.nextInt(7));
                    if (r == ys.length - 1 && rnd.nextDouble() < 0.3) b = b.withCantilever(Side.NORTH, 2 + rnd.nextInt(7));
                    if (!b.cantilevers().isEmpty() && rnd.nextDouble() < 0.3) // an enclosed cantilevered floor, say
                        b = b.withCantileverOccupancy(roof ? use : FLOOR_USES.get(rnd.nextInt(FLOOR_USES.size())));
                    bays.add(b);
                }
            if (bays.stream().noneMatch(b -> !b.opening()))
                bays = replaceFirst(bays, g, roof ? "roof-ordinary" : main);
            levels.add(roof ? Level.roof("R", 12.0 * k, rnd.nextInt(13) / 2.0, bays) : Level.floor("F" + k, 12.0 * k, bays));
        }
        return building(g, levels);
    }

    private static List<Bay> replaceFirst(List<Bay> bays, Grid g, String use) {
        List<Bay> out = new ArrayList<>();
        for (Bay b : bays) if (!(b.col() == 0 && b.row() == 0)) out.add(b);
        out.add(Bay.floor(0, 0, use, 50, new Framing(Direction.X, 1)));
        return out;
    }

    private static double[] spacings(Random rnd, int n) {
        double[] s = new double[n];
        for (int i = 0; i < n; i++) s[i] = 10 + rnd.nextInt(51) / 2.0; // 10 to 35 ft in half feet
        return s;
    }
}
