package com.baysheet.store;

import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.SelfWeights;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.Optional;

/**
 * The self weights a project's members carry: the project's own where it states them (every sheet says "project
 * value"), else the firm's defaults by role (V109; "firm default"), converted exactly for an SI project.
 */
public final class SelfWeightStore {
    private final ModelWrites writes;

    public SelfWeightStore(ModelWrites writes) {
        this.writes = writes;
    }

    /** The project's own values, or empty where it takes the firm's defaults. */
    public Optional<ProjectSelfWeights> find(long projectId) {
        return writes.sql().tx(c -> {
            ProjectStore.find(c, projectId);
            return own(c, projectId);
        });
    }

    /** The firm's defaults as the project's members would carry them (plf, or kN/m on an SI project). */
    public SelfWeights firmDefaults(long projectId) {
        return writes.sql().tx(c -> firm(c, ProjectStore.find(c, projectId).info().units()));
    }

    /** Sets the project's own values, or with null goes back to the firm's defaults. */
    public void set(Editor who, long projectId, long version, ProjectSelfWeights w) {
        writes.change(who, c -> "self weights set: " + describe(w) + "; was: " + describe(own(c, projectId).orElse(null)), projectId, version, c -> {
            write(c, projectId, w);
            return null;
        });
    }

    /** The project's own values (null: the firm's defaults), in the caller's change. */
    static void write(Connection c, long projectId, ProjectSelfWeights w) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "UPDATE project SET sw_infill_beam = ?, sw_grid_beam = ?, sw_girder = ?, sw_column = ? WHERE id = ?")) {
            double[] v = w == null ? null : new double[] {w.infillBeam(), w.gridBeam(), w.girder(), w.column()};
            for (int i = 0; i < 4; i++) {
                if (v == null) ps.setNull(i + 1, Types.DOUBLE);
                else ps.setDouble(i + 1, v[i]);
            }
            ps.setLong(5, projectId);
            ps.executeUpdate();
        }
    }

    /** The weights the project's members carry, with where they come from. */
    static SelfWeights forProject(Connection c, long projectId, UnitSystem units) throws SQLException {
        Optional<ProjectSelfWeights> own = own(c, projectId);
        if (own.isPresent()) {
            ProjectSelfWeights w = own.get();
            return new SelfWeights(w.infillBeam(), w.gridBeam(), w.girder(), w.column(), "project value");
        }
        return firm(c, units);
    }

    static Optional<ProjectSelfWeights> own(Connection c, long projectId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT sw_infill_beam, sw_grid_beam, sw_girder, sw_column FROM project WHERE id = ?")) {
            ps.setLong(1, projectId);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next() || rs.getObject(1) == null) return Optional.empty();
                return Optional.of(new ProjectSelfWeights(rs.getDouble(1), rs.getDouble(2), rs.getDouble(3), rs.getDouble(4)));
            }
        }
    }

    /** The firm's self weights by role (plf), converted exactly for an SI project; all 0: not included, and said so. */
    static SelfWeights firm(Connection c, UnitSystem units) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "SELECT sw_infill_beam, sw_grid_beam, sw_girder, sw_column FROM firm_setting WHERE id = 1");
             ResultSet rs = ps.executeQuery()) {
            if (!rs.next()) return SelfWeights.NONE;
            double k = units == UnitSystem.SI ? Convert.KN_PER_M_PER_PLF : 1;
            double i = rs.getDouble(1), g = rs.getDouble(2), gi = rs.getDouble(3), col = rs.getDouble(4);
            if (i == 0 && g == 0 && gi == 0 && col == 0) return SelfWeights.NONE;
            return new SelfWeights(i * k, g * k, gi * k, col * k, "firm default");
        }
    }

    private static String describe(ProjectSelfWeights w) {
        if (w == null) return "the firm's defaults";
        return "infill beams " + Display.plain(w.infillBeam()) + ", grid beams " + Display.plain(w.gridBeam()) + ", girders "
                + Display.plain(w.girder()) + ", columns " + Display.plain(w.column());
    }
}
