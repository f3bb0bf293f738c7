package com.baysheet.store;

import com.baysheet.project.StoredLevel;
import com.baysheet.project.LevelInfo;
import com.baysheet.engine.InputError;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Typical levels: a level made the same as another has that level's bays (it keeps none of its own, so editing
 * the typical changes every level linked to it), and its own name, elevation, line loads and members. Unlinking
 * a level makes it an independent copy of the typical's bays; copying gives other levels a level's bays once,
 * to be changed freely afterwards. Every change goes through {@link ModelWrites#change} with its audit entry.
 */
public final class TypicalLevels {
    private final ModelWrites writes;

    public TypicalLevels(ModelWrites writes) {
        this.writes = writes;
    }

    /** Makes each of {@code levelIds} the same as {@code typicalId}; whatever bays they had of their own go. */
    public void link(Editor who, long projectId, long version, long typicalId, List<Long> levelIds) {
        requireSome(levelIds);
        writes.change(who, c -> "levels made the same as " + TypicalRules.typical(c, projectId, typicalId).name() + ": "
                + describe(c, projectId, levelIds), projectId, version, c -> {
            for (long id : levelIds) linkIn(c, projectId, typicalId, id);
            return null;
        });
    }

    /** Makes one level the same as a typical in the caller's change, or refuses the link (see {@link TypicalRules}). */
    static void linkIn(Connection c, long projectId, long typicalId, long levelId) throws SQLException {
        StoredLevel typical = TypicalRules.typical(c, projectId, typicalId);
        StoredLevel l = TypicalRules.linkable(c, projectId, typical, levelId);
        deleteBays(c, l.id());
        setTypical(c, l.id(), typical.id());
    }

    /**
     * Adds {@code count} levels above the typical, {@code storeyHeight} apart (ft or m), each the same as it:
     * typical floors entered once. Names count on from the typical's ("Level 3" gives "Level 4", "Level 5", ...).
     */
    public List<StoredLevel> repeat(Editor who, long projectId, long version, long typicalId, int count, double storeyHeight) {
        TypicalRepeat r = new TypicalRepeat(count, storeyHeight, "count", "storeyHeight");
        return writes.change(who, c -> "typical level " + LevelStore.find(c, projectId, typicalId).name() + " repeated "
                + count + " times, " + com.baysheet.engine.units.Display.plain(storeyHeight) + " apart", projectId, version,
                c -> r.addAbove(c, projectId, typicalId));
    }

    /** Makes a linked level an independent copy of its typical's bays as they stand; later edits to the typical leave it. */
    public void unlink(Editor who, long projectId, long version, long levelId) {
        writes.change(who, c -> "level " + LevelStore.find(c, projectId, levelId).name() + " unlinked from its typical "
                + typicalName(c, projectId, levelId), projectId, version, c -> {
            StoredLevel l = LevelStore.find(c, projectId, levelId);
            if (!l.linked()) throw new InputError("typicalOf", l.name(), "is not the same as another level: it has bays of its own");
            unlink(c, l);
            return null;
        });
    }

    /** Gives each of {@code toIds} a copy of {@code fromId}'s bays (replacing theirs); the copies are then their own. */
    public void copy(Editor who, long projectId, long version, long fromId, List<Long> toIds) {
        requireSome(toIds);
        writes.change(who, c -> "bays of " + LevelStore.find(c, projectId, fromId).name() + " copied to: "
                + describe(c, projectId, toIds), projectId, version, c -> {
            StoredLevel from = LevelStore.find(c, projectId, fromId);
            long source = from.linked() ? from.typicalOf() : from.id();
            for (long id : toIds) {
                StoredLevel to = LevelStore.find(c, projectId, id);
                if (to.id() == from.id()) throw new InputError("levels", to.name(), "is the level copied from");
                if (to.linked()) throw new InputError("levels", to.name(), "is the same as another level: unlink it first");
                deleteBays(c, to.id());
                copyBays(c, source, to.id());
            }
            return null;
        });
    }

    /** Before a typical is deleted: every level linked to it becomes an independent copy of its bays. */
    static void release(Connection c, long projectId, long typicalId) throws SQLException {
        for (StoredLevel l : linkedTo(c, projectId, typicalId)) unlink(c, l);
    }

    /** "; levels made independent copies: Level 3, Level 4" for the audit entry of a typical's deletion (empty if none). */
    static String releasedText(Connection c, long projectId, long typicalId) throws SQLException {
        List<StoredLevel> linked = linkedTo(c, projectId, typicalId);
        return linked.isEmpty() ? "" : "; levels made independent copies: "
                + linked.stream().map(StoredLevel::name).collect(Collectors.joining(", "));
    }

    /** "; also on Level 3, Level 4 (the same as it)" for the audit entry of a bay change on a typical (empty if none). */
    static String alsoText(Connection c, long projectId, long typicalId) throws SQLException {
        List<StoredLevel> linked = linkedTo(c, projectId, typicalId);
        return linked.isEmpty() ? "" : "; also on " + linked.stream().map(StoredLevel::name).collect(Collectors.joining(", "))
                + " (the same as it)";
    }

    /** The level whose bays a level has: its typical, or itself. */
    static long baysOf(StoredLevel l) {
        return l.linked() ? l.typicalOf() : l.id();
    }

    /** Refuses a bay change on a linked level: its bays are its typical's, edited there. */
    static void requireOwnBays(Connection c, long projectId, long levelId) throws SQLException {
        StoredLevel l = LevelStore.find(c, projectId, levelId);
        if (l.linked())
            throw new InputError("typicalOf", l.name(), "is the same as " + LevelStore.find(c, projectId, l.typicalOf()).name()
                    + ": edit the bays there (every level linked to it changes), or unlink this level first");
    }

    static List<StoredLevel> linkedTo(Connection c, long projectId, long typicalId) throws SQLException {
        return LevelStore.findByProject(c, projectId).stream().filter(l -> l.linked() && l.typicalOf() == typicalId).toList();
    }

    private static void unlink(Connection c, StoredLevel l) throws SQLException {
        deleteBays(c, l.id());
        copyBays(c, l.typicalOf(), l.id());
        setTypical(c, l.id(), null);
    }

    private static String typicalName(Connection c, long projectId, long levelId) throws SQLException {
        StoredLevel l = LevelStore.find(c, projectId, levelId);
        return l.linked() ? LevelStore.find(c, projectId, l.typicalOf()).name() : "(none)";
    }

    /** The levels by name with what they held before: "Level 3 (was: 12 bays of its own)". */
    private static String describe(Connection c, long projectId, List<Long> ids) throws SQLException {
        List<String> out = new ArrayList<>();
        for (long id : ids) {
            StoredLevel l = LevelStore.find(c, projectId, id);
            out.add(l.name() + " (was: " + (l.linked() ? "the same as " + LevelStore.find(c, projectId, l.typicalOf()).name()
                    : countBays(c, l.id()) + " bays of its own") + ")");
        }
        return String.join(", ", out);
    }

    private static void requireSome(List<Long> ids) {
        if (ids == null || ids.isEmpty()) throw new InputError("levels", "none", "choose at least one level");
    }

    private static void setTypical(Connection c, long levelId, Long typicalId) throws SQLException {
        try (Handle h = Sql.on(c)) {
            h.createUpdate("UPDATE building_level SET typical_of = :typical WHERE id = :id")
                    .bind("typical", typicalId).bind("id", levelId).execute();
        }
    }

    private static void deleteBays(Connection c, long levelId) throws SQLException {
        try (Handle h = Sql.on(c)) {
            h.createUpdate("DELETE FROM bay WHERE level_id = :level").bind("level", levelId).execute();
        }
    }

    private static int countBays(Connection c, long levelId) throws SQLException {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT COUNT(*) FROM bay WHERE level_id = :level").bind("level", levelId).mapTo(Integer.class).one();
        }
    }

    /** Copies every column of the bay rows (whatever columns the bay table has), with the target's level id. */
    private static void copyBays(Connection c, long fromLevel, long toLevel) throws SQLException {
        try (Handle h = Sql.on(c)) {
            List<String> cols = h.createQuery("SELECT * FROM bay WHERE 1 = 0").scanResultSet((rows, ctx) -> {
                ResultSetMetaData meta = rows.get().getMetaData();
                List<String> names = new ArrayList<>();
                for (int i = 1; i <= meta.getColumnCount(); i++) {
                    String name = meta.getColumnLabel(i).toLowerCase();
                    if (!name.equals("level_id")) names.add(name);
                }
                return names;
            });
            String list = String.join(", ", cols);
            h.createUpdate("INSERT INTO bay (level_id, " + list + ") SELECT :to, " + list + " FROM bay WHERE level_id = :from")
                    .bind("to", toLevel).bind("from", fromLevel).execute();
        }
    }
}
