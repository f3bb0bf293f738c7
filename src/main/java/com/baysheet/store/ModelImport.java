package com.baysheet.store;

import com.baysheet.project.ProjectInfo;
import com.baysheet.project.Project;
import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Limits;
import com.fasterxml.jackson.databind.JsonNode;

import com.baysheet.framing.model.Submittal;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.util.HashMap;
import java.util.Map;

/**
 * A new project from a model file ({@link ModelExport}'s shape), in one transaction: the project, its grid, its
 * levels with their bays and line loads, then the typical links, derived and checked like every change. A value
 * the file gets wrong is refused naming where it is ("levels[Level 2].bays[1].occupancy") and nothing is stored.
 */
public final class ModelImport {
    private final ModelWrites writes;

    public ModelImport(ModelWrites writes) {
        this.writes = writes;
    }

    /** @param jobNumber the new project's job number, or blank for the file's own */
    public Project create(Editor who, JsonNode file, String jobNumber) {
        return create(who, file, jobNumber, null, "project imported from a model file");
    }

    /**
     * A new job from an old one: the project's model (settings, grid, levels, bays, loads, weights, submittal data)
     * as its model file would carry it, under a new job number and, where given, a new name. Its reviews, revisions
     * and marks' history stay with the old job; the new one starts with no sheets.
     */
    public Project copy(Editor who, long projectId, String jobNumber, String name) {
        if (jobNumber == null || jobNumber.isBlank()) throw new InputError("jobNumber", "", "give the new job's number");
        JsonNode file = writes.sql().tx(c -> ModelExport.write(c, projectId));
        String from = file.path("project").path("jobNumber").asText();
        return create(who, file, jobNumber, name, "project created as a copy of " + from);
    }

    private Project create(Editor who, JsonNode file, String jobNumber, String name, String how) {
        if (file == null || !file.isObject()) throw new InputError("file", "not a JSON object", "is not a model file");
        if (file.path("format").isIntegralNumber() && file.path("format").asInt() > ModelExport.FORMAT)
            throw new InputError("format", file.path("format"), "is a later model file than this server reads (" + ModelExport.FORMAT + ")");
        ProjectInfo read = ModelJson.project(file.path("project"));
        ProjectInfo info = new ProjectInfo(blank(jobNumber) ? read.jobNumber() : jobNumber, blank(name) ? read.name() : name,
                read.address(), read.client(), read.edition(), read.units(), read.partitionAllowance(), read.reducePartitions(),
                read.upliftReducedDead(), read.snow(), read.floorMethod());
        Grid grid = ModelJson.grid(file.path("grid"));
        JsonNode levels = file.path("levels");
        if (!levels.isMissingNode() && !levels.isArray()) throw new InputError("levels", levels.getNodeType(), "must be a list of levels");
        Limits.count("levels", levels.size(), Limits.MAX_LEVELS, "levels in a project");
        return writes.create(who, how + ": " + info.jobNumber() + " " + info.name() + ", " + levels.size() + " levels",
                c -> {
                    long id = insert(c, info, grid, withIds(file.path("grid"), grid), levels, writes.sql().stamp());
                    projectExtras(c, id, file);
                    return id;
                });
    }

    private static boolean blank(String s) {
        return s == null || s.isBlank();
    }

    /** Brings a deleted project back from its kept model file, with its own job number; {@code also} runs in the same transaction. */
    Project restore(Editor who, JsonNode file, String action, Sql.Work<?> also) {
        ProjectInfo info = ModelJson.project(file.path("project"));
        Grid grid = ModelJson.grid(file.path("grid"));
        return writes.create(who, action, c -> {
            long id = insert(c, info, grid, withIds(file.path("grid"), grid), file.path("levels"), writes.sql().stamp());
            projectExtras(c, id, file);
            also.run(c);
            return id;
        });
    }

    private static long insert(Connection c, ProjectInfo info, Grid grid, Grid given, JsonNode levels, OffsetDateTime now) throws SQLException {
        long id = ProjectStore.insert(c, info, grid, now);
        if (given != null) GridStore.createAsGiven(c, id, given);
        Grid stored = GridStore.find(c, id);
        Map<String, Long> ids = new HashMap<>();
        for (JsonNode l : levels) {
            String where = "levels[" + l.path("name").asText("?") + "].";
            long levelId = within(where, () -> LevelStore.insert(c, id, ModelJson.level(l)).id());
            ids.put(l.path("name").asText().strip().toLowerCase(), levelId);
            int i = 0;
            for (JsonNode b : l.path("bays")) {
                String at = where + "bays[" + i++ + "].";
                within(at, () -> { BayStore.put(c, id, levelId, ModelJson.bays(b, stored)); return null; });
            }
            for (JsonNode w : l.path("lineLoads")) {
                String at = where + "lineLoads[" + w.path("label").asText("?") + "].";
                within(at, () -> LineLoadStore.insert(c, id, levelId, ModelJson.lineLoad(w)));
            }
            for (JsonNode q : l.path("pointLoads")) {
                String at = where + "pointLoads[" + q.path("label").asText("?") + "].";
                within(at, () -> PointLoadStore.insert(c, id, levelId, ModelJson.pointLoad(q)));
            }
            int k = 0;
            for (JsonNode w : l.path("memberWeights")) {
                String at = where + "memberWeights[" + k++ + "].";
                within(at, () -> { memberWeight(c, id, levelId, w); return null; });
            }
        }
        for (JsonNode l : levels) {
            if (!l.hasNonNull("sameAs")) continue;
            String where = "levels[" + l.path("name").asText() + "].";
            Long typical = ids.get(l.get("sameAs").asText().strip().toLowerCase());
            if (typical == null) throw new InputError(where + "sameAs", l.get("sameAs").asText(), "names no level of this file");
            if (l.path("bays").size() > 0)
                throw new InputError(where + "bays", l.path("bays").size() + " entries", "a level the same as another has no bays of its own");
            long levelId = ids.get(l.path("name").asText().strip().toLowerCase());
            within(where, () -> { TypicalLevels.linkIn(c, id, typical, levelId); return null; });
        }
        return id;
    }

    /** A weight entered for one member of the level: its id within the level (as exported) and the weight per length. */
    private static void memberWeight(Connection c, long projectId, long levelId, JsonNode w) {
        com.baysheet.engine.JsonFields f = com.baysheet.engine.JsonFields.of(w);
        String member = f.text("member", "");
        if (!member.matches("-[A-Za-z0-9-]{1,100}")) throw new InputError("member", member, "is not a member of a level as this server exports it");
        double weight = f.number("weight");
        com.baysheet.engine.Check.nonNegative("weight", weight);
        SelfWeightStore.writeMember(c, projectId, "L" + levelId + member, weight);
    }

    /** The project's own self weights and its submittal data, where the file gives them. */
    private static void projectExtras(Connection c, long id, JsonNode file) throws SQLException {
        JsonNode w = file.path("selfWeights");
        if (w.isObject()) {
            com.baysheet.engine.JsonFields f = com.baysheet.engine.JsonFields.of(w);
            ProjectSelfWeights own = within("selfWeights.", () -> new ProjectSelfWeights(f.number("infillBeam"), f.number("gridBeam"),
                    f.number("girder"), f.number("column")));
            SelfWeightStore.write(c, id, own);
        }
        JsonNode s = file.path("submittal");
        if (s.isObject()) {
            com.baysheet.engine.JsonFields f = com.baysheet.engine.JsonFields.of(s);
            Submittal site = within("submittal.", () -> new Submittal("", "", f.text("engineerOfRecord", ""), f.text("licenceNumber", ""),
                    f.text("licenceState", ""), f.text("buildingCode", ""), f.text("codeYear", "")));
            SubmittalStore.write(c, id, site);
        }
    }

    /** The grid with the line ids the file gives on both axes, or null where it gives none (fresh ids then). */
    private static Grid withIds(JsonNode n, Grid grid) {
        if (!n.path("x").has("ids") && !n.path("y").has("ids")) return null;
        return new Grid(grid.x().withIds(ids(n, "x")), grid.y().withIds(ids(n, "y")));
    }

    private static java.util.List<Integer> ids(JsonNode n, String axis) {
        java.util.List<Integer> out = new java.util.ArrayList<>();
        for (JsonNode id : n.path(axis).path("ids")) {
            if (!id.isIntegralNumber() || !id.canConvertToInt()) throw new InputError("grid." + axis + ".ids", id, "a grid line id is a whole number");
            out.add(id.asInt());
        }
        return out;
    }

    private interface Step<T> {
        T run() throws SQLException;
    }

    /** Runs a step, naming where in the file a value it refuses is. */
    private static <T> T within(String where, Step<T> step) throws SQLException {
        try {
            return step.run();
        } catch (InputError e) {
            String problem = e.problem(), got = " (got " + e.value() + ")";
            if (problem.endsWith(got)) problem = problem.substring(0, problem.length() - got.length());
            throw new InputError(where + e.field(), e.value(), problem);
        }
    }
}
