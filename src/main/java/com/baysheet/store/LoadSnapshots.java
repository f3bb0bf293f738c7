package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.project.StoredLevel;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.sql.Connection;
import java.sql.SQLException;

/**
 * A deleted line load or point load as kept ({@link DeletedItems}): its level's row id and the load in the model
 * file's shape, placed by the names of its grid lines. Restored onto the same level through the same insert as an
 * added load, so every check an added load meets (its lines in the grid, its label free on the level, a member
 * beneath it) is met again, and a refusal says why it cannot come back.
 */
final class LoadSnapshots {
    /** The kinds and the array of the model file each is written in. */
    static final String LINE = "lineLoads", POINT = "pointLoads";

    private LoadSnapshots() {}

    /** The load of this label on the level, as the file writes it, with the level's id; null where none has it. */
    static ObjectNode of(Connection c, long projectId, StoredLevel l, String array, String label) throws SQLException {
        ObjectNode loads = DeletedItems.JSON.createObjectNode();
        ModelExport.loads(c, loads, l, GridStore.find(c, projectId));
        for (JsonNode n : loads.path(array)) {
            if (!n.path("label").asText().equalsIgnoreCase(label)) continue;
            ObjectNode out = DeletedItems.JSON.createObjectNode();
            out.put("format", ModelExport.FORMAT);
            out.put("level", l.id());
            out.put("array", array);
            out.set("load", n);
            return out;
        }
        return null;
    }

    /** The label of the level's line load of this id (the label names it on its level, where the id names it nowhere a person reads). */
    static String lineLabel(Connection c, long projectId, long levelId, long id) throws SQLException {
        LevelStore.find(c, projectId, levelId);
        return LineLoadStore.findByLevel(c, levelId, GridStore.find(c, projectId)).stream().filter(w -> w.id() == id)
                .map(com.baysheet.project.StoredLineLoad::label).findFirst().orElseThrow(() -> new NotFound("line load", id));
    }

    static String pointLabel(Connection c, long projectId, long levelId, long id) throws SQLException {
        LevelStore.find(c, projectId, levelId);
        return PointLoadStore.findByLevel(c, levelId, GridStore.find(c, projectId)).stream().filter(q -> q.id() == id)
                .map(StoredPointLoad::label).findFirst().orElseThrow(() -> new NotFound("point load", id));
    }

    /** Keeps the load of this label before it is deleted, in the deleting change's transaction. */
    static void keep(Connection c, Editor who, long projectId, StoredLevel l, String array, String label, java.time.Instant at)
            throws SQLException {
        ObjectNode snap = of(c, projectId, l, array, label);
        if (snap == null) return;
        var p = ProjectStore.find(c, projectId);
        boolean line = array.equals(LINE);
        DeletedItems.keep(c, new DeletedItem(0, projectId, p.info().jobNumber(), line ? DeletedItem.LINE_LOAD : DeletedItem.POINT_LOAD,
                (line ? "Line load " : "Point load ") + label + " on " + l.name() + ", " + p.info().jobNumber() + " " + p.info().name(),
                0, who.username(), at), snap);
    }

    static void restore(Connection c, long projectId, JsonNode snap, String label) throws SQLException {
        long levelId = snap.path("level").asLong();
        try {
            LevelStore.find(c, projectId, levelId);
        } catch (NotFound e) {
            throw new InputError("item", label, "cannot be restored: its level was deleted after it (restore the level first)");
        }
        JsonNode load = snap.path("load");
        try {
            if (snap.path("array").asText().equals(LINE)) LineLoadStore.insert(c, projectId, levelId, ModelJson.lineLoad(load));
            else PointLoadStore.insert(c, projectId, levelId, ModelJson.pointLoad(load));
        } catch (InputError e) {
            throw new InputError("item", label, "cannot be restored: " + e.getMessage());
        }
    }
}
