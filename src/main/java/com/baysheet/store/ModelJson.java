package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.engine.JsonFields;
import com.baysheet.engine.code.Editions;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Limits;
import com.baysheet.framing.model.RoofSurface;
import com.baysheet.framing.model.Side;
import com.baysheet.engine.snow.Choices;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.project.FirmOccupancy;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.LineLoadEntry;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.SnowInput;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Reads the model from JSON, for the API and the demo data alike, so that both are validated the same
 * way: a missing or mistyped value is an {@link InputError} naming the field. The values are read by
 * {@link JsonFields}, as the command line reads a member; fields the model does not know are ignored.
 */
public final class ModelJson {
    private ModelJson() {}

    public static ProjectInfo project(JsonNode n) {
        return project(n, Editions.builtIn().byDefault().id());
    }

    /** @param edition the edition when the body names none (a firm's default for a new project, a project's own on a change) */
    public static ProjectInfo project(JsonNode node, String edition) {
        JsonFields n = JsonFields.of(node);
        return new ProjectInfo(n.text("jobNumber"), n.text("name"), n.text("address", ""), n.text("client", ""),
                n.has("edition") ? n.text("edition") : edition, UnitSystem.parse("units", n.text("units")),
                n.flag("partitionAllowance", false), n.flag("reducePartitions", false), n.flag("upliftReducedDead", false), snow(n),
                n.text("floorMethod", ""));
    }

    /** The optional snow fields of a project (see {@link SnowInput}); no groundSnow, no snow. */
    static com.baysheet.engine.snow.SnowSite snow(JsonFields n) {
        if (!n.has("groundSnow")) return null;
        return SnowInput.of(n.number("groundSnow"), n.text("snowTerrain", ""), n.text("snowExposure", ""), n.number("exposureFactor", Double.NaN),
                n.text("thermalCondition", ""), n.number("thermalFactor", Double.NaN), n.text("riskCategory", ""));
    }

    public static Grid grid(JsonNode n) {
        return new Grid(axis(n, "x"), axis(n, "y"));
    }

    public static LevelInfo level(JsonNode node) {
        JsonFields n = JsonFields.of(node);
        boolean roof = n.flag("roof", false);
        return new LevelInfo(n.text("name"), n.number("elevation"), roof, roof ? n.number("roofSlope") : Double.NaN, surface(n));
    }

    /** A roof's snow surface: {@code roofShape} MONOSLOPE (default) or HIP_OR_GABLE, {@code slippery}, {@code eaveToRidge}. */
    static RoofSurface surface(JsonFields n) {
        var shape = n.has("roofShape") ? Choices.parse(SnowRoof.Shape.class, "roofShape", n.text("roofShape")) : SnowRoof.Shape.MONOSLOPE;
        return new RoofSurface(shape, n.flag("slippery", false), n.number("eaveToRidge", Double.NaN));
    }

    /**
     * A bay assignment: {@code cells} as [[col,row], ...] or the ranges {@code cols} and {@code rows} as
     * [first,last], checked against this grid before any cell is listed; {@code cantileverOccupancy} absent or
     * null for the default balcony of the bay's occupancy.
     */
    public static BayAssignment bays(JsonNode node, Grid grid) {
        JsonFields n = JsonFields.of(node);
        List<Cell> cells = cells(node, grid);
        if (n.flag("opening", false)) return BayAssignment.opening(cells);
        Framing f = new Framing(Direction.valueOf(choice(n, "beams", "X", "Y")), n.integer("infillBeams"));
        Map<Side, Double> cantilevers = new EnumMap<>(Side.class);
        if (n.has("cantilevers")) {
            JsonFields cn = n.object("cantilevers");
            for (Side s : Side.values()) {
                String key = s.name().toLowerCase();
                if (cn.has(key)) cantilevers.put(s, cn.number(key));
            }
        }
        return new BayAssignment(cells, false, n.text("occupancy"), n.number("deadLoad"), f, cantilevers,
                n.has("cantileverOccupancy") ? n.text("cantileverOccupancy") : null);
    }

    /** The selected cells; a range reaching past the grid is refused before it is expanded. */
    public static List<Cell> cells(JsonNode n, Grid grid) {
        List<Cell> cells = new ArrayList<>();
        if (n.has("cells")) {
            Limits.count("cells", n.get("cells").size(), Limits.MAX_CELLS_PER_REQUEST, "cells in one request");
            for (JsonNode c : n.get("cells")) {
                if (!c.isArray() || c.size() != 2 || !whole(c.get(0)) || !whole(c.get(1)))
                    throw new InputError("cells", c, "a cell is given as [column, row]");
                cells.add(new Cell(c.get(0).asInt(), c.get(1).asInt()));
            }
        } else {
            int[] cols = range(n, "cols", grid.x().cells());
            int[] rows = range(n, "rows", grid.y().cells());
            for (int r = rows[0]; r <= rows[1]; r++)
                for (int c = cols[0]; c <= cols[1]; c++) cells.add(new Cell(c, r));
        }
        return cells;
    }

    /**
     * A line load: {@code line}, {@code from} and {@code to} by grid line name (a whole number such as 2 is read as
     * the name "2"), {@code axis} only where a name is on both axes; {@code dead}, or {@code deadPressure} and
     * {@code height}; {@code live} (default 0) with {@code liveOccupancy}; {@code partitionWall} (default false).
     */
    public static LineLoadEntry lineLoad(JsonNode node) {
        JsonFields n = JsonFields.of(node);
        return new LineLoadEntry(n.has("axis") ? choice(n, "axis", "X", "Y").toLowerCase() : null,
                lineName(n, "line"), lineName(n, "from"), lineName(n, "to"), n.text("label"), n.number("dead", Double.NaN),
                n.number("deadPressure", Double.NaN), n.number("height", Double.NaN), n.number("live", 0),
                n.has("liveOccupancy") ? n.text("liveOccupancy") : null, n.flag("partitionWall", false));
    }

    /**
     * A point load: {@code label}, {@code dead} (default 0), {@code live} (default 0) with {@code liveOccupancy}; in a bay
     * by {@code xLine} and {@code yLine} (the lines at its west and south sides) with {@code x} and {@code y} from that
     * corner, or on a grid-line member by {@code line}, {@code from}, {@code to} (and {@code axis} where a name is on
     * both axes) with {@code distance} from the from line toward the to line.
     */
    public static PointLoadEntry pointLoad(JsonNode node) {
        JsonFields n = JsonFields.of(node);
        double dead = n.number("dead", 0), live = n.number("live", 0);
        String occ = n.has("liveOccupancy") ? n.text("liveOccupancy") : null;
        if (n.has("line") || n.has("distance"))
            return PointLoadEntry.onMember(n.text("label"), n.has("axis") ? choice(n, "axis", "X", "Y").toLowerCase() : null,
                    lineName(n, "line"), lineName(n, "from"), lineName(n, "to"), n.number("distance"), dead, live, occ);
        return PointLoadEntry.inBay(n.text("label"), lineName(n, "xLine"), lineName(n, "yLine"), n.number("x"), n.number("y"),
                dead, live, occ);
    }

    public static FirmOccupancy firmOccupancy(JsonNode node) {
        JsonFields n = JsonFields.of(node);
        return new FirmOccupancy(n.text("id"), n.text("name"), UnitSystem.parse("units", n.text("units")),
                n.number("uniform"), n.number("concentrated", 0), n.number("contactSide"),
                ReductionRule.parse("rule", n.text("rule")), n.flag("assembly", false));
    }

    public static long version(JsonNode n) {
        if (!n.path("version").isIntegralNumber() || !n.path("version").canConvertToLong())
            throw new InputError("version", n.path("version"), "give the version of the project this change is based on");
        return n.get("version").asLong();
    }

    private static GridAxis axis(JsonNode n, String axis) {
        JsonNode a = n.path(axis);
        List<String> names = new ArrayList<>();
        for (JsonNode name : a.path("names")) names.add(name.asText());
        List<Double> spacings = new ArrayList<>();
        int i = 0;
        for (JsonNode s : a.path("spacings")) {
            if (!s.isNumber()) throw new InputError("grid." + axis + ".spacings[" + i + "]", s, "must be a number");
            spacings.add(s.asDouble());
            i++;
        }
        return new GridAxis(axis, names, spacings);
    }

    /** [first, last] within the grid's {@code cells} along that axis. */
    private static int[] range(JsonNode n, String field, int cells) {
        JsonNode r = n.path(field);
        if (!r.isArray() || r.size() != 2 || !whole(r.get(0)) || !whole(r.get(1))
                || r.get(0).asInt() > r.get(1).asInt())
            throw new InputError(field, r, "give [first, last] indices, or cells as [[column, row], ...]");
        int first = r.get(0).asInt(), last = r.get(1).asInt();
        if (first < 0 || last >= cells)
            throw new InputError(field, r, "must lie within the grid: indices 0 to " + (cells - 1));
        return new int[]{first, last};
    }

    /** A whole number that fits an int: not 1.5, not 2^40 (which asInt would wrap). */
    private static boolean whole(JsonNode v) {
        return v.isIntegralNumber() && v.canConvertToInt();
    }

    private static String choice(JsonFields n, String field, String... allowed) {
        String v = n.text(field).toUpperCase();
        for (String a : allowed) if (a.equals(v)) return v;
        throw new InputError(field, v, "must be one of " + String.join(", ", allowed));
    }

    /** A grid line's name, where a whole number such as 2 stands for the name "2". */
    private static String lineName(JsonFields n, String field) {
        JsonNode v = n.node(field);
        return v != null && v.isIntegralNumber() && v.canConvertToInt() ? v.asText() : n.text(field);
    }
}
