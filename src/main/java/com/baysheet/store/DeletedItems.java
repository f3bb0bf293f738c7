package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.time.Duration;
import java.time.Instant;
import java.util.List;

/**
 * What was deleted, kept for 30 days as a snapshot in the model file's shape ({@link ModelExport}), with who deleted
 * it and when. A delete writes its row in its own transaction; rows older than {@link #KEPT} are purged whenever the
 * list is read (and at start). Restoring puts the item back through the normal path ({@link ModelWrites}) and
 * removes its row in the same transaction.
 */
public final class DeletedItems {
    /** How long a deleted item can be restored. */
    public static final Duration KEPT = Duration.ofDays(30);

    static final ObjectMapper JSON = new ObjectMapper();

    private final ModelWrites writes;

    public DeletedItems(ModelWrites writes) {
        this.writes = writes;
    }

    /** The items kept, newest first, after purging those past {@link #KEPT}. */
    public List<DeletedItem> list() {
        purge();
        return writes.sql().tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT id, project_id, job_number, kind, label, members, deleted_by, deleted_at "
                        + "FROM deleted_item ORDER BY deleted_at DESC, id DESC").map((rs, ctx) -> new DeletedItem(rs.getLong("id"),
                        rs.getLong("project_id"), rs.getString("job_number"), rs.getString("kind"), rs.getString("label"),
                        rs.getInt("members"), rs.getString("deleted_by"), rs.getObject("deleted_at", java.time.OffsetDateTime.class).toInstant())).list();
            }
        });
    }

    /** Removes the items deleted more than {@link #KEPT} ago; returns how many. */
    public int purge() {
        Instant before = writes.sql().now().minus(KEPT);
        return writes.sql().tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createUpdate("DELETE FROM deleted_item WHERE deleted_at < :before").bind("before", Sql.stampOf(before)).execute();
            }
        });
    }

    /**
     * Puts a kept item back and removes it from the list; returns what was restored, in the user's words. A level
     * whose name or elevation another level now has, or a project whose job number is now taken, is refused saying so.
     */
    public String restore(Editor who, long itemId) {
        Kept k = writes.sql().tx(c -> find(c, itemId));
        if (k.item.kind().equals(DeletedItem.PROJECT)) {
            new ModelImport(writes).restore(who, k.snapshot, "project restored: " + k.item.label(), c -> forget(c, itemId));
        } else {
            long version = writes.sql().tx(c -> {
                try {
                    return ProjectStore.find(c, k.item.projectId()).version();
                } catch (NotFound e) {
                    throw new InputError("item", k.item.label(), "cannot be restored: its project was deleted after it (restoring the project brings it back as it was then, without this " + k.item.kind() + ")");
                }
            });
            String kind = k.item.kind();
            writes.change(who, kind + " restored: " + k.item.label(), k.item.projectId(), version, c -> {
                switch (kind) {
                    case DeletedItem.BAYS -> BaySnapshots.restore(c, k.item.projectId(), k.snapshot, k.item.label());
                    case DeletedItem.LINE_LOAD, DeletedItem.POINT_LOAD -> LoadSnapshots.restore(c, k.item.projectId(), k.snapshot, k.item.label());
                    default -> LevelSnapshots.restore(c, k.item.projectId(), k.snapshot);
                }
                forget(c, itemId);
                return null;
            });
        }
        return k.item.label();
    }

    /** Keeps a deleted item, in the deleting change's transaction. */
    static void keep(Connection c, DeletedItem item, JsonNode snapshot) {
        try (Handle h = Sql.on(c)) {
            h.createUpdate("INSERT INTO deleted_item (project_id, job_number, kind, label, members, snapshot, deleted_by, deleted_at) "
                            + "VALUES (:project, :job, :kind, :label, :members, :snapshot, :by, :at)")
                    .bind("project", item.projectId()).bind("job", item.jobNumber()).bind("kind", item.kind())
                    .bind("label", clip(item.label(), 300)).bind("members", item.members()).bind("snapshot", snapshot.toString())
                    .bind("by", clip(item.deletedBy(), 100)).bind("at", Sql.stampOf(item.deletedAt())).execute();
        }
    }

    private record Kept(DeletedItem item, JsonNode snapshot) {}

    private static Kept find(Connection c, long itemId) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT * FROM deleted_item WHERE id = :id").bind("id", itemId).map((rs, ctx) -> {
                try {
                    return new Kept(new DeletedItem(rs.getLong("id"), rs.getLong("project_id"), rs.getString("job_number"),
                            rs.getString("kind"), rs.getString("label"), rs.getInt("members"), rs.getString("deleted_by"),
                            rs.getObject("deleted_at", java.time.OffsetDateTime.class).toInstant()), JSON.readTree(rs.getString("snapshot")));
                } catch (JsonProcessingException e) {
                    throw new IllegalStateException("deleted item " + itemId + " has an unreadable snapshot", e);
                }
            }).findOne().orElseThrow(() -> new NotFound("deleted item", itemId));
        }
    }

    private static Void forget(Connection c, long itemId) {
        try (Handle h = Sql.on(c)) {
            h.createUpdate("DELETE FROM deleted_item WHERE id = :id").bind("id", itemId).execute();
        }
        return null;
    }

    private static String clip(String s, int max) {
        return s.length() <= max ? s : s.substring(0, max - 1) + "…";
    }
}
