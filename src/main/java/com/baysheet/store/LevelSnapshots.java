package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Grid;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.StoredLevel;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.sql.Connection;
import java.sql.SQLException;

/**
 * A deleted level as kept ({@link DeletedItems}): the level in the model file's shape with its bays (a typical level's
 * are its typical's, kept too), its line and point loads, its row id and the grid it was laid out on. Restored with
 * the same row id, so that its members come back with the same ids (they follow the level and the grid lines).
 */
final class LevelSnapshots {
    private LevelSnapshots() {}

    static ObjectNode of(Connection c, long projectId, StoredLevel l) throws SQLException {
        Grid g = GridStore.find(c, projectId);
        ObjectNode out = DeletedItems.JSON.createObjectNode();
        out.put("format", ModelExport.FORMAT);
        out.put("id", l.id());
        out.set("grid", ModelExport.grid(g));
        ObjectNode n = ModelExport.level(out.putObject("level"), l.info());
        if (l.linked()) n.put("sameAs", LevelStore.find(c, projectId, l.typicalOf()).name());
        ModelExport.bays(n.putArray("bays"), BayStore.findByLevel(c, TypicalLevels.baysOf(l), g));
        ModelExport.loads(c, n, l, g);
        return out;
    }

    /**
     * Puts the level back as it was, refusing a grid changed since (its bays and loads are placed by the lines) and a
     * name or elevation another level now has. A typical level is linked again where its typical is still there and
     * typical itself; otherwise it comes back with a copy of the bays it had.
     */
    static void restore(Connection c, long projectId, JsonNode snap) throws SQLException {
        Grid g = GridStore.find(c, projectId);
        LevelInfo info = ModelJson.level(snap.path("level"));
        if (!ModelExport.grid(g).equals(snap.path("grid")))
            throw new InputError("item", info.name(), "cannot be restored: the grid has changed since the level was deleted, "
                    + "and its bays and loads are placed by the old grid lines");
        try {
            LevelStore.requireUnique(c, projectId, info, -1);
        } catch (InputError e) {
            throw new InputError("item", info.name(), "cannot be restored: its " + e.field() + " " + e.problem()
                    + " now; rename or move that level first");
        }
        long id = LevelStore.insertAs(c, projectId, snap.path("id").asLong(), info);
        StoredLevel typical = typical(c, projectId, snap.path("level").path("sameAs").asText(""));
        if (typical != null) TypicalLevels.linkIn(c, projectId, typical.id(), id);
        else for (JsonNode b : snap.path("level").path("bays")) BayStore.put(c, projectId, id, ModelJson.bays(b, g));
        for (JsonNode w : snap.path("level").path("lineLoads")) LineLoadStore.insert(c, projectId, id, ModelJson.lineLoad(w));
        for (JsonNode q : snap.path("level").path("pointLoads")) PointLoadStore.insert(c, projectId, id, ModelJson.pointLoad(q));
    }

    /** The level of this name that a restored level may be the same as again: one that is itself typical, not linked. */
    private static StoredLevel typical(Connection c, long projectId, String name) {
        if (name.isBlank()) return null;
        return LevelStore.findByProject(c, projectId).stream().filter(l -> l.name().equalsIgnoreCase(name) && !l.linked())
                .findFirst().orElse(null);
    }
}
