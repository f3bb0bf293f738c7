package com.baysheet.store;

import com.baysheet.project.StoredLevel;
import com.baysheet.project.LevelInfo;
import com.baysheet.engine.InputError;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * What a typical link may join. One level deep: a typical has bays of its own and a linked level has none, so a
 * link never runs through another link and the derivation never follows a chain (nor a cycle). Both levels are
 * of one project, on its one grid, and both floors or both roofs (a roof's bays carry roof live and snow load).
 */
final class TypicalRules {
    private static final Pattern NUMBERED = Pattern.compile("^(.*?)(\\d{1,6})$");

    private TypicalRules() {}

    /** The level others are to be the same as: of this project, with bays of its own. */
    static StoredLevel typical(Connection c, long projectId, long typicalId) throws SQLException {
        Long owner = projectOf(c, typicalId);
        if (owner == null) throw new NotFound("level", typicalId);
        if (owner != projectId)
            throw new InputError("typicalOf", typicalId, "is a level of another project, on another grid: a level can be the same "
                    + "only as a level of its own project");
        StoredLevel t = LevelStore.find(c, projectId, typicalId);
        if (t.linked())
            throw new InputError("typicalOf", t.name(), "is itself the same as " + LevelStore.find(c, projectId, t.typicalOf()).name()
                    + ": make the levels the same as that level");
        return t;
    }

    /** The level to be linked to {@code typical}: not the typical itself, not making a cycle, not a typical of others. */
    static StoredLevel linkable(Connection c, long projectId, StoredLevel typical, long levelId) throws SQLException {
        StoredLevel l = LevelStore.find(c, projectId, levelId);
        if (l.id() == typical.id()) throw new InputError("levels", l.name(), "cannot be the same as itself");
        List<StoredLevel> followers = TypicalLevels.linkedTo(c, projectId, l.id());
        if (!followers.isEmpty())
            throw new InputError("levels", l.name(), "is the typical of " + followers.stream().map(StoredLevel::name)
                    .collect(Collectors.joining(", ")) + ": a typical cannot itself be the same as another level "
                    + "(unlink those levels, or make them the same as " + typical.name() + ")");
        if (l.info().roof() != typical.info().roof())
            throw new InputError("levels", l.name(), "is a " + kind(l) + " and " + typical.name() + " a " + kind(typical)
                    + ": a level can be the same only as a level of its own kind");
        return l;
    }

    /** A level saved as a roof or a floor keeps the kind of the levels it is linked with. */
    static void requireSameKind(Connection c, long projectId, long levelId, LevelInfo info) throws SQLException {
        StoredLevel l = LevelStore.find(c, projectId, levelId);
        if (l.info().roof() == info.roof()) return;
        boolean joined = l.linked() || !TypicalLevels.linkedTo(c, projectId, levelId).isEmpty();
        if (joined)
            throw new InputError("roof", info.roof(), "cannot change while the level is linked as a typical level: "
                    + "a roof and a floor cannot have the same bays (unlink first)");
    }

    /** The name of the k-th level above a typical: "Level 3" gives "Level 4", "Level 5"; other names get " +k". */
    static String nameAbove(String name, int k) {
        Matcher m = NUMBERED.matcher(name);
        if (m.matches()) return m.group(1) + (Long.parseLong(m.group(2)) + k);
        return name + " +" + k;
    }

    private static String kind(StoredLevel l) { return l.info().roof() ? "roof" : "floor"; }

    private static Long projectOf(Connection c, long levelId) throws SQLException {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT project_id FROM building_level WHERE id = :id").bind("id", levelId)
                    .mapTo(Long.class).findOne().orElse(null);
        }
    }
}
