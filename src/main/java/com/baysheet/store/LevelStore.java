package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.Display;

import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.framing.model.RoofSurface;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.SnowInput;
import com.baysheet.project.StoredLevel;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.StatementContext;
import org.jdbi.v3.core.statement.Update;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.List;

/** A project's levels, lowest first. */
public final class LevelStore {
    private final ModelWrites writes;

    public LevelStore(ModelWrites writes) {
        this.writes = writes;
    }

    public List<StoredLevel> findByProject(long projectId) {
        return writes.sql().tx(c -> {
            ProjectStore.find(c, projectId);
            return findByProject(c, projectId);
        });
    }

    /** A level of this project; a level of another project is not found. */
    public StoredLevel find(long projectId, long levelId) {
        return writes.sql().tx(c -> find(c, projectId, levelId));
    }

    public StoredLevel add(Editor who, long projectId, long version, LevelInfo info) {
        return add(who, projectId, version, info, null);
    }

    /** Adds a level and, with {@code above} (null: none), that many typical levels above it the same as it, in one change. */
    public StoredLevel add(Editor who, long projectId, long version, LevelInfo info, TypicalRepeat above) {
        String action = "level added: " + describe(info) + (above == null ? "" : ", and " + above.describe());
        return writes.change(who, action, projectId, version, c -> {
            StoredLevel l = insert(c, projectId, info);
            if (above != null) above.addAbove(c, projectId, l.id());
            return l;
        });
    }

    /** Adds a level with bays of its own, refusing a name or elevation another level has, in the caller's change. */
    static StoredLevel insert(Connection c, long projectId, LevelInfo info) throws SQLException {
        requireUnique(c, projectId, info, -1);
        SnowInput.checkRoof(ProjectStore.find(c, projectId).info(), info, "eaveToRidge");
        try (Handle h = Sql.on(c)) {
            long id = bind(h.createUpdate("INSERT INTO building_level (project_id, name, elevation, is_roof, roof_slope, roof_shape, "
                            + "roof_slippery, eave_to_ridge) VALUES (:project, :name, :elevation, :roof, :roofSlope, :roofShape, "
                            + ":slippery, :eaveToRidge)"), info)
                    .bind("project", projectId)
                    .executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
            return new StoredLevel(id, projectId, info);
        }
    }

    public void update(Editor who, long projectId, long version, long levelId, LevelInfo info) {
        writes.change(who, c -> "level saved: " + describe(info) + "; was: " + describe(find(c, projectId, levelId).info()), projectId, version, c -> {
            find(c, projectId, levelId);
            requireUnique(c, projectId, info, levelId);
            TypicalRules.requireSameKind(c, projectId, levelId, info);
            SnowInput.checkRoof(ProjectStore.find(c, projectId).info(), info, "eaveToRidge");
            try (Handle h = Sql.on(c)) {
                return bind(h.createUpdate("UPDATE building_level SET name = :name, elevation = :elevation, is_roof = :roof, "
                        + "roof_slope = :roofSlope, roof_shape = :roofShape, roof_slippery = :slippery, eave_to_ridge = :eaveToRidge "
                        + "WHERE id = :id"), info).bind("id", levelId).execute();
            }
        });
    }

    /**
     * Removes a level with all its bays, kept for 30 days ({@link DeletedItems}); the levels that were the same as it
     * become independent copies first. Issued sheets of its members are withdrawn, not removed ({@link ModelWrites#removal}).
     */
    public void delete(Editor who, long projectId, long version, long levelId) {
        int members = writes.members(projectId, find(projectId, levelId).name());
        writes.removal(who, c -> "level deleted: " + describe(find(c, projectId, levelId).info())
                + TypicalLevels.releasedText(c, projectId, levelId), projectId, version, c -> {
            StoredLevel l = find(c, projectId, levelId);
            var p = ProjectStore.find(c, projectId);
            DeletedItems.keep(c, new DeletedItem(0, projectId, p.info().jobNumber(), DeletedItem.LEVEL,
                    l.name() + " of " + p.info().jobNumber() + " " + p.info().name(), members, who.username(), writes.sql().now()),
                    LevelSnapshots.of(c, projectId, l));
            TypicalLevels.release(c, projectId, levelId);
            try (Handle h = Sql.on(c)) {
                return h.createUpdate("DELETE FROM building_level WHERE id = :id").bind("id", levelId).execute();
            }
        });
    }

    /** The issued sheets deleting this level would withdraw or change, by name, without deleting it (for its confirmation). */
    public List<String> touchedByDelete(long projectId, long version, long levelId) {
        return writes.touched(projectId, version, c -> {
            find(c, projectId, levelId);
            TypicalLevels.release(c, projectId, levelId);
            try (Handle h = Sql.on(c)) {
                return h.createUpdate("DELETE FROM building_level WHERE id = :id").bind("id", levelId).execute();
            }
        });
    }

    /** Puts a deleted level back with its own row id (its members' ids follow it), in the caller's change. */
    static long insertAs(Connection c, long projectId, long id, LevelInfo info) throws SQLException {
        SnowInput.checkRoof(ProjectStore.find(c, projectId).info(), info, "eaveToRidge");
        try (Handle h = Sql.on(c)) {
            bind(h.createUpdate("INSERT INTO building_level (id, project_id, name, elevation, is_roof, roof_slope, roof_shape, "
                    + "roof_slippery, eave_to_ridge) VALUES (:id, :project, :name, :elevation, :roof, :roofSlope, :roofShape, "
                    + ":slippery, :eaveToRidge)"), info).bind("id", id).bind("project", projectId).execute();
            return id;
        }
    }

    /** A level as a line of text for its audit entry. */
    static String describe(LevelInfo i) {
        return i.name() + " at " + Display.plain(i.elevation())
                + (i.roof() ? ", roof" + (Double.isNaN(i.roofSlope()) ? "" : " sloped " + Display.plain(i.roofSlope())) : "");
    }

    private static final String COLUMNS = "id, project_id, name, elevation, is_roof, roof_slope, roof_shape, roof_slippery, eave_to_ridge, typical_of";

    static List<StoredLevel> findByProject(Connection c, long projectId) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT " + COLUMNS + " FROM building_level WHERE project_id = :project ORDER BY elevation, id")
                    .bind("project", projectId).map(LevelStore::read).list();
        }
    }

    static StoredLevel find(Connection c, long projectId, long levelId) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT " + COLUMNS + " FROM building_level WHERE id = :id AND project_id = :project")
                    .bind("id", levelId).bind("project", projectId).map(LevelStore::read).findOne()
                    .orElseThrow(() -> new NotFound("level", levelId));
        }
    }

    /** Two levels may share neither a name nor an elevation: the take-down orders them by elevation. */
    static void requireUnique(Connection c, long projectId, LevelInfo info, long self) {
        for (StoredLevel other : findByProject(c, projectId)) {
            if (other.id() == self) continue;
            if (other.name().equalsIgnoreCase(info.name()))
                throw new InputError("name", info.name(), "is already the name of another level");
            if (other.info().elevation() == info.elevation())
                throw new InputError("elevation", info.elevation(), "is already the elevation of " + other.name());
        }
    }

    private static Update bind(Update u, LevelInfo info) {
        RoofSurface r = info.surface();
        return u.bind("name", info.name()).bind("elevation", info.elevation()).bind("roof", info.roof())
                .bind("roofSlope", Sql.orNull(info.roofSlope()))
                .bind("roofShape", r.shape() == SnowRoof.Shape.MONOSLOPE ? null : r.shape().name())
                .bind("slippery", r.slippery()).bind("eaveToRidge", Sql.orNull(r.eaveToRidge()));
    }

    private static StoredLevel read(ResultSet rs, StatementContext ctx) throws SQLException {
        return new StoredLevel(rs.getLong("id"), rs.getLong("project_id"), new LevelInfo(rs.getString("name"),
                rs.getDouble("elevation"), rs.getBoolean("is_roof"), Sql.getDouble(rs, "roof_slope"),
                new RoofSurface(rs.getString("roof_shape") == null ? SnowRoof.Shape.MONOSLOPE : SnowRoof.Shape.valueOf(rs.getString("roof_shape")),
                        rs.getBoolean("roof_slippery"), Sql.getDouble(rs, "eave_to_ridge"))),
                rs.getObject("typical_of") == null ? null : rs.getLong("typical_of"));
    }
}
