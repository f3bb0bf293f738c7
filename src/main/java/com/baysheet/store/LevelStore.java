package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.Display;

import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.framing.model.RoofSurface;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
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
        return writes.change(who, "level added: " + describe(info), projectId, version, c -> insert(c, projectId, info));
    }

    /** Adds a level with bays of its own, refusing a name or elevation another level has, in the caller's change. */
    static StoredLevel insert(Connection c, long projectId, LevelInfo info) throws SQLException {
        requireUnique(c, projectId, info, -1);
        SnowInput.checkRoof(ProjectStore.find(c, projectId).info(), info, "eaveToRidge");
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO building_level (project_id, name, elevation, "
                + "is_roof, roof_slope, roof_shape, roof_slippery, eave_to_ridge) VALUES (?, ?, ?, ?, ?, ?, ?, ?)", Statement.RETURN_GENERATED_KEYS)) {
            ps.setLong(1, projectId);
            bind(ps, 2, info);
            ps.executeUpdate();
            try (ResultSet keys = ps.getGeneratedKeys()) {
                keys.next();
                return new StoredLevel(keys.getLong(1), projectId, info);
            }
        }
    }

    public void update(Editor who, long projectId, long version, long levelId, LevelInfo info) {
        writes.change(who, c -> "level saved: " + describe(info) + "; was: " + describe(find(c, projectId, levelId).info()), projectId, version, c -> {
            find(c, projectId, levelId);
            requireUnique(c, projectId, info, levelId);
            TypicalRules.requireSameKind(c, projectId, levelId, info);
            SnowInput.checkRoof(ProjectStore.find(c, projectId).info(), info, "eaveToRidge");
            try (PreparedStatement ps = c.prepareStatement(
                    "UPDATE building_level SET name = ?, elevation = ?, is_roof = ?, roof_slope = ?, roof_shape = ?, "
                    + "roof_slippery = ?, eave_to_ridge = ? WHERE id = ?")) {
                bind(ps, 1, info);
                ps.setLong(8, levelId);
                return ps.executeUpdate();
            }
        });
    }

    /** Removes a level with all its bays; the levels that were the same as it become independent copies first. */
    public void delete(Editor who, long projectId, long version, long levelId) {
        writes.change(who, c -> "level deleted: " + describe(find(c, projectId, levelId).info())
                + TypicalLevels.releasedText(c, projectId, levelId), projectId, version, c -> {
            find(c, projectId, levelId);
            TypicalLevels.release(c, projectId, levelId);
            try (PreparedStatement ps = c.prepareStatement("DELETE FROM building_level WHERE id = ?")) {
                ps.setLong(1, levelId);
                return ps.executeUpdate();
            }
        });
    }

    /** A level as a line of text for its audit entry. */
    static String describe(LevelInfo i) {
        return i.name() + " at " + Display.plain(i.elevation())
                + (i.roof() ? ", roof" + (Double.isNaN(i.roofSlope()) ? "" : " sloped " + Display.plain(i.roofSlope())) : "");
    }

    static List<StoredLevel> findByProject(Connection c, long projectId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT id, project_id, name, elevation, is_roof, roof_slope, roof_shape, roof_slippery, eave_to_ridge, typical_of "
                + "FROM building_level WHERE project_id = ? ORDER BY elevation, id")) {
            ps.setLong(1, projectId);
            List<StoredLevel> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) out.add(read(rs));
            }
            return out;
        }
    }

    static StoredLevel find(Connection c, long projectId, long levelId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT id, project_id, name, elevation, is_roof, roof_slope, roof_shape, roof_slippery, eave_to_ridge, typical_of "
                + "FROM building_level WHERE id = ? AND project_id = ?")) {
            ps.setLong(1, levelId);
            ps.setLong(2, projectId);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) throw new NotFound("level", levelId);
                return read(rs);
            }
        }
    }

    /** Two levels may share neither a name nor an elevation: the take-down orders them by elevation. */
    private static void requireUnique(Connection c, long projectId, LevelInfo info, long self) throws SQLException {
        for (StoredLevel other : findByProject(c, projectId)) {
            if (other.id() == self) continue;
            if (other.name().equalsIgnoreCase(info.name()))
                throw new InputError("name", info.name(), "is already the name of another level");
            if (other.info().elevation() == info.elevation())
                throw new InputError("elevation", info.elevation(), "is already the elevation of " + other.name());
        }
    }

    private static void bind(PreparedStatement ps, int i, LevelInfo info) throws SQLException {
        ps.setString(i, info.name());
        ps.setDouble(i + 1, info.elevation());
        ps.setBoolean(i + 2, info.roof());
        Sql.setDouble(ps, i + 3, info.roofSlope());
        RoofSurface r = info.surface();
        ps.setString(i + 4, r.shape() == SnowRoof.Shape.MONOSLOPE ? null : r.shape().name());
        ps.setBoolean(i + 5, r.slippery());
        Sql.setDouble(ps, i + 6, r.eaveToRidge());
    }

    private static StoredLevel read(ResultSet rs) throws SQLException {
        return new StoredLevel(rs.getLong("id"), rs.getLong("project_id"), new LevelInfo(rs.getString("name"),
                rs.getDouble("elevation"), rs.getBoolean("is_roof"), Sql.getDouble(rs, "roof_slope"),
                new RoofSurface(rs.getString("roof_shape") == null ? SnowRoof.Shape.MONOSLOPE : SnowRoof.Shape.valueOf(rs.getString("roof_shape")),
                        rs.getBoolean("roof_slippery"), Sql.getDouble(rs, "eave_to_ridge"))),
                rs.getObject("typical_of") == null ? null : rs.getLong("typical_of"));
    }
}
