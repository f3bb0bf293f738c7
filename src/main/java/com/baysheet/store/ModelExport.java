package com.baysheet.store;

import com.baysheet.project.StoredLineLoad;
import com.baysheet.project.StoredLevel;
import com.baysheet.project.Project;
import com.baysheet.project.LevelInfo;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridPointLoad;
import com.baysheet.framing.model.Submittal;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A project's model as one JSON file, in the fields the API and {@link ModelJson} read (docs/api.md): the project's
 * settings (with its own self weights where it states them, and its submittal data), the grid, and each level with its bays (bays that hold the same are one entry with their cells), its
 * line and point loads and, for a typical level, {@code sameAs} naming its typical instead of bays. The grid lines carry their
 * stable ids, so that member ids (which follow the lines) come back the same. Numbers are written in
 * full (Jackson writes the shortest text that reads back as the same double), so an import derives the same members.
 */
public final class ModelExport {
    /** The version of this file's shape; an import refuses a file of a later one. */
    public static final int FORMAT = 1;

    private static final ObjectMapper JSON = new ObjectMapper();

    private final Sql sql;

    public ModelExport(Sql sql) {
        this.sql = sql;
    }

    public ObjectNode of(long projectId) {
        return sql.tx(c -> write(c, projectId));
    }

    static ObjectNode write(Connection c, long projectId) throws SQLException {
        Project p = ProjectStore.find(c, projectId);
        Grid g = GridStore.find(c, projectId);
        ObjectNode out = JSON.createObjectNode();
        out.put("format", FORMAT);
        out.set("project", JSON.valueToTree(p.info()));
        SelfWeightStore.own(c, projectId).ifPresent(w -> out.set("selfWeights", JSON.valueToTree(w)));
        Submittal site = SubmittalStore.find(c, projectId);
        ObjectNode sub = out.putObject("submittal");
        sub.put("engineerOfRecord", site.engineerOfRecord()).put("licenceNumber", site.licenceNumber())
                .put("licenceState", site.licenceState()).put("buildingCode", site.buildingCode()).put("codeYear", site.codeYear());
        out.set("grid", grid(g));
        List<StoredLevel> levels = LevelStore.findByProject(c, projectId);
        Map<Long, String> names = new LinkedHashMap<>();
        for (StoredLevel l : levels) names.put(l.id(), l.name());
        Map<String, Double> own = SelfWeightStore.members(c, projectId);
        ArrayNode ls = out.putArray("levels");
        for (StoredLevel l : levels) {
            ObjectNode n = level(ls.addObject(), l.info());
            if (l.linked()) n.put("sameAs", names.get(l.typicalOf()));
            else bays(n.putArray("bays"), BayStore.findByLevel(c, l.id(), g));
            loads(c, n, l, g);
            memberWeights(n, own, "L" + l.id());
        }
        return out;
    }

    /** The weights entered for the level's members, each by its id within the level (the level's own key left off). */
    private static void memberWeights(ObjectNode level, Map<String, Double> own, String key) {
        ArrayNode out = null;
        for (Map.Entry<String, Double> e : own.entrySet()) {
            if (!e.getKey().startsWith(key + "-")) continue;
            if (out == null) out = level.putArray("memberWeights");
            out.addObject().put("member", e.getKey().substring(key.length())).put("weight", e.getValue());
        }
    }

    /** The grid as the file writes it, its lines' stable ids included. */
    static ObjectNode grid(Grid g) {
        ObjectNode grid = JSON.createObjectNode();
        axis(grid.putObject("x"), g.x());
        axis(grid.putObject("y"), g.y());
        return grid;
    }

    /** A level's line and point loads as the file writes them. */
    static void loads(Connection c, ObjectNode n, StoredLevel l, Grid g) throws SQLException {
        ArrayNode loads = n.putArray("lineLoads");
        for (StoredLineLoad w : LineLoadStore.findByLevel(c, l.id(), g)) lineLoad(loads.addObject(), w);
        ArrayNode points = n.putArray("pointLoads");
        for (GridPointLoad q : PointLoadStore.forBuilding(c, g, List.of(l))) pointLoad(points.addObject(), q, g);
    }

    private static void axis(ObjectNode n, GridAxis a) {
        ArrayNode names = n.putArray("names");
        for (String name : a.names()) names.add(name);
        ArrayNode spacings = n.putArray("spacings");
        for (double s : a.spacings()) spacings.add(s);
        ArrayNode ids = n.putArray("ids");
        for (int id : a.ids()) ids.add(id);
    }

    static ObjectNode level(ObjectNode n, LevelInfo i) {
        n.put("name", i.name());
        n.put("elevation", i.elevation());
        n.put("roof", i.roof());
        if (!i.roof()) return n;
        n.put("roofSlope", i.roofSlope());
        n.put("roofShape", i.surface().shape().name());
        n.put("slippery", i.surface().slippery());
        if (!Double.isNaN(i.surface().eaveToRidge())) n.put("eaveToRidge", i.surface().eaveToRidge());
        return n;
    }

    /** One entry per distinct bay, listing its cells in the order the level holds them (south row first). */
    static void bays(ArrayNode out, List<Bay> bays) {
        Map<ObjectNode, ArrayNode> byContent = new LinkedHashMap<>();
        for (Bay b : bays) {
            ObjectNode content = content(b);
            ArrayNode cells = byContent.computeIfAbsent(content, k -> JSON.createArrayNode());
            cells.addArray().add(b.col()).add(b.row());
        }
        byContent.forEach((content, cells) -> {
            ObjectNode entry = out.addObject();
            entry.set("cells", cells);
            entry.setAll(content);
        });
    }

    private static ObjectNode content(Bay b) {
        ObjectNode n = JSON.createObjectNode();
        if (b.opening()) return n.put("opening", true);
        n.put("occupancy", b.occupancy());
        n.put("deadLoad", b.deadLoad());
        n.put("beams", b.framing().beams().name());
        n.put("infillBeams", b.framing().infillBeams());
        if (!b.cantilevers().isEmpty()) {
            ObjectNode cn = n.putObject("cantilevers");
            b.cantilevers().entrySet().stream().sorted(Map.Entry.comparingByKey())
                    .forEach(e -> cn.put(e.getKey().name().toLowerCase(), e.getValue()));
        }
        if (b.cantileverOccupancy() != null) n.put("cantileverOccupancy", b.cantileverOccupancy());
        return n;
    }

    /** A point load by the names of the lines it is placed by, in the fields {@link ModelJson#pointLoad} reads. */
    private static void pointLoad(ObjectNode n, GridPointLoad q, Grid g) {
        n.put("label", q.label());
        if (q.inBay()) {
            n.put("xLine", g.x().name(q.col())).put("yLine", g.y().name(q.row())).put("x", q.x()).put("y", q.y());
        } else {
            GridAxis own = q.onXLine() ? g.x() : g.y(), across = q.onXLine() ? g.y() : g.x();
            n.put("axis", q.onXLine() ? "X" : "Y").put("line", own.name(q.line())).put("from", across.name(q.from()))
                    .put("to", across.name(q.to())).put("distance", q.distance());
        }
        n.put("dead", q.dead()).put("live", q.live());
        if (q.liveOccupancy() != null) n.put("liveOccupancy", q.liveOccupancy());
    }

    /** A cladding load keeps its weight per area and height (the import multiplies them again), any other its dead load. */
    private static void lineLoad(ObjectNode n, StoredLineLoad w) {
        n.put("axis", w.axis().toUpperCase());
        n.put("line", w.line());
        n.put("from", w.from());
        n.put("to", w.to());
        n.put("label", w.label());
        if (w.cladding()) {
            n.put("deadPressure", w.deadPressure());
            n.put("height", w.height());
        } else n.put("dead", w.dead());
        n.put("live", w.live());
        if (w.liveOccupancy() != null) n.put("liveOccupancy", w.liveOccupancy());
        n.put("partitionWall", w.partitionWall());
    }
}
