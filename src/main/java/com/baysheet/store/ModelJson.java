package com.baysheet.store;

import com.baysheet.engine.InputError;
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
import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Reads the model from JSON, for the API and the demo data alike, so that both are validated the same
 * way: a missing or mistyped value is an {@link InputError} naming the field.
 */
public final class ModelJson {
    private ModelJson() {}

    public static ProjectInfo project(JsonNode n) {
        return project(n, Editions.builtIn().byDefault().id());
    }

    /** @param edition the edition when the body names none (a firm's default for a new project, a project's own on a change) */
    public static ProjectInfo project(JsonNode n, String edition) {
        return new ProjectInfo(text(n, "jobNumber"), text(n, "name"), optText(n, "address"), optText(n, "client"),
                n.hasNonNull("edition") ? text(n, "edition") : edition, UnitSystem.parse("units", text(n, "units")),
                flag(n, "partitionAllowance"), flag(n, "reducePartitions"), flag(n, "upliftReducedDead"), snow(n),
                optText(n, "floorMethod"));
    }

    /** The optional snow fields of a project (see {@link SnowInput}); no groundSnow, no snow. */
    static com.baysheet.engine.snow.SnowSite snow(JsonNode n) {
        if (!n.hasNonNull("groundSnow")) return null;
        return SnowInput.of(number(n, "groundSnow"), optText(n, "snowTerrain"), optText(n, "snowExposure"), optNumber(n, "exposureFactor"),
                optText(n, "thermalCondition"), optNumber(n, "thermalFactor"), optText(n, "riskCategory"));
    }

    private static double optNumber(JsonNode n, String field) { return n.hasNonNull(field) ? number(n, field) : Double.NaN; }

    public static Grid grid(JsonNode n) {
        return new Grid(axis(n, "x"), axis(n, "y"));
    }

    public static LevelInfo level(JsonNode n) {
        boolean roof = flag(n, "roof");
        return new LevelInfo(text(n, "name"), number(n, "elevation"), roof, roof ? number(n, "roofSlope") : Double.NaN, surface(n));
    }

    /** A roof's snow surface: {@code roofShape} MONOSLOPE (default) or HIP_OR_GABLE, {@code slippery}, {@code eaveToRidge}. */
    static RoofSurface surface(JsonNode n) {
        var shape = n.hasNonNull("roofShape") ? Choices.parse(SnowRoof.Shape.class, "roofShape", text(n, "roofShape")) : SnowRoof.Shape.MONOSLOPE;
        return new RoofSurface(shape, flag(n, "slippery"), optNumber(n, "eaveToRidge"));
    }

    /**
     * A bay assignment: {@code cells} as [[col,row], ...] or the ranges {@code cols} and {@code rows} as
     * [first,last], checked against this grid before any cell is listed; {@code cantileverOccupancy} absent or
     * null for the default balcony of the bay's occupancy.
     */
    public static BayAssignment bays(JsonNode n, Grid grid) {
        List<Cell> cells = cells(n, grid);
        if (flag(n, "opening")) return BayAssignment.opening(cells);
        Framing f = new Framing(Direction.valueOf(choice(n, "beams", "X", "Y")), integer(n, "infillBeams"));
        Map<Side, Double> cantilevers = new EnumMap<>(Side.class);
        JsonNode cn = n.path("cantilevers");
        for (Side s : Side.values()) {
            String key = s.name().toLowerCase();
            if (cn.hasNonNull(key)) cantilevers.put(s, number(cn, key, "cantilevers." + key));
        }
        return new BayAssignment(cells, false, text(n, "occupancy"), number(n, "deadLoad"), f, cantilevers,
                n.hasNonNull("cantileverOccupancy") ? text(n, "cantileverOccupancy") : null);
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
    public static LineLoadEntry lineLoad(JsonNode n) {
        return new LineLoadEntry(n.hasNonNull("axis") ? choice(n, "axis", "X", "Y").toLowerCase() : null,
                lineName(n, "line"), lineName(n, "from"), lineName(n, "to"), text(n, "label"), optNumber(n, "dead"),
                optNumber(n, "deadPressure"), optNumber(n, "height"), n.hasNonNull("live") ? number(n, "live") : 0,
                n.hasNonNull("liveOccupancy") ? text(n, "liveOccupancy") : null, flag(n, "partitionWall"));
    }

    public static FirmOccupancy firmOccupancy(JsonNode n) {
        return new FirmOccupancy(text(n, "id"), text(n, "name"), UnitSystem.parse("units", text(n, "units")),
                number(n, "uniform"), n.has("concentrated") ? number(n, "concentrated") : 0, number(n, "contactSide"),
                ReductionRule.parse("rule", text(n, "rule")), flag(n, "assembly"));
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

    private static String text(JsonNode n, String field) {
        JsonNode v = n.path(field);
        if (!v.isTextual() || v.asText().isBlank()) throw new InputError(field, v, "is required (text)");
        return v.asText();
    }

    private static String optText(JsonNode n, String field) {
        return n.hasNonNull(field) ? n.get(field).asText() : "";
    }

    private static String choice(JsonNode n, String field, String... allowed) {
        String v = text(n, field).toUpperCase();
        for (String a : allowed) if (a.equals(v)) return v;
        throw new InputError(field, v, "must be one of " + String.join(", ", allowed));
    }

    private static boolean flag(JsonNode n, String field) {
        JsonNode v = n.path(field);
        if (v.isMissingNode() || v.isNull()) return false;
        if (!v.isBoolean()) throw new InputError(field, v, "must be true or false");
        return v.asBoolean();
    }

    private static double number(JsonNode n, String field) {
        return number(n, field, field);
    }

    private static double number(JsonNode n, String key, String field) {
        JsonNode v = n.path(key);
        if (!v.isNumber()) throw new InputError(field, v.isMissingNode() ? "nothing" : v, "must be a number");
        return v.asDouble();
    }

    private static String lineName(JsonNode n, String field) {
        JsonNode v = n.path(field);
        return v.isIntegralNumber() && v.canConvertToInt() ? v.asText() : text(n, field);
    }

    private static int integer(JsonNode n, String field) {
        JsonNode v = n.path(field);
        if (!v.isIntegralNumber() || !v.canConvertToInt())
            throw new InputError(field, v.isMissingNode() ? "nothing" : v, "must be a whole number");
        return v.asInt();
    }
}
