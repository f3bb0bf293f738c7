package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.project.Cell;
import com.baysheet.project.StoredLevel;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Cleared bays as kept ({@link DeletedItems}): the level's row id, and each bay in the model file's shape with the
 * stable ids of the four grid lines around it. Restored into the same cell, bounded by the same lines (a spacing may
 * have changed), so that its members come back with the same ids; refused where the grid has no room for it now (a
 * line it was bounded by removed, or one added through it) or the cell holds a bay again.
 */
final class BaySnapshots {
    private BaySnapshots() {}

    /** The bays the cells hold now (none: null, nothing to keep). */
    static ObjectNode of(Connection c, long projectId, StoredLevel l, List<Cell> cells) throws SQLException {
        Grid g = GridStore.find(c, projectId);
        Set<String> asked = new HashSet<>();
        for (Cell cell : cells) asked.add(cell.key());
        ObjectNode out = DeletedItems.JSON.createObjectNode();
        out.put("format", ModelExport.FORMAT);
        out.put("level", l.id());
        ArrayNode bays = out.putArray("bays");
        for (Bay b : BayStore.findByLevel(c, l.id(), g)) {
            if (!asked.contains(b.col() + "," + b.row())) continue;
            ObjectNode n = bays.addObject();
            n.put("name", g.bayName(b.col(), b.row()));
            n.putArray("xLines").add(g.x().id(b.col())).add(g.x().id(b.col() + 1));
            n.putArray("yLines").add(g.y().id(b.row())).add(g.y().id(b.row() + 1));
            ArrayNode one = DeletedItems.JSON.createArrayNode();
            ModelExport.bays(one, List.of(b));
            n.set("bay", one.get(0));
        }
        return bays.isEmpty() ? null : out;
    }

    /** Puts the bays back in their cells of the level, in the caller's change; every refusal names the bay. */
    static void restore(Connection c, long projectId, JsonNode snap, String label) throws SQLException {
        long levelId = snap.path("level").asLong();
        try {
            LevelStore.find(c, projectId, levelId);
        } catch (NotFound e) {
            throw new InputError("item", label, "cannot be restored: its level was deleted after them (restore the level first)");
        }
        Grid g = GridStore.find(c, projectId);
        List<Bay> held = BayStore.findByLevel(c, TypicalLevels.baysOf(LevelStore.find(c, projectId, levelId)), g);
        Set<String> taken = new HashSet<>();
        for (Bay b : held) taken.add(b.col() + "," + b.row());
        List<JsonNode> placed = new ArrayList<>();
        for (JsonNode n : snap.path("bays")) {
            String name = n.path("name").asText();
            int col = cell(g.x(), n.path("xLines")), row = cell(g.y(), n.path("yLines"));
            if (col < 0 || row < 0)
                throw new InputError("item", label, "cannot be restored: the grid has no room for bay " + name + " now (a grid line "
                        + "around it was removed, or one was added through it); put the grid back as it was, or enter the bay again");
            if (taken.contains(col + "," + row))
                throw new InputError("item", label, "cannot be restored: " + g.bayName(col, row) + " holds a bay again; "
                        + "leave it unframed first, or keep what it holds now");
            ObjectNode entry = ((ObjectNode) n.path("bay")).deepCopy();
            entry.putArray("cells").addArray().add(col).add(row);
            placed.add(entry);
        }
        for (JsonNode entry : placed) BayStore.put(c, projectId, levelId, ModelJson.bays(entry, g));
    }

    /** The cell between the two stored line ids, where they are still neighbours in this axis; else -1. */
    private static int cell(com.baysheet.framing.model.GridAxis axis, JsonNode ids) {
        int i = axis.indexOf(ids.path(0).asInt(-1));
        return i >= 0 && i + 1 < axis.lines() && axis.id(i + 1) == ids.path(1).asInt(-1) ? i : -1;
    }
}
