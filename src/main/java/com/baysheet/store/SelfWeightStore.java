package com.baysheet.store;

import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.SelfWeights;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

import org.jdbi.v3.core.Handle;

/**
 * The self weights a project's members carry: the project's own where it states them (every sheet says "project
 * value"), else the firm's defaults by role (V109; "firm default"), converted exactly for an SI project; and a single
 * member's own weight where the engineer entered one (V121; "entered for this member").
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

    /** The weights entered for single members of the project, by derived member id, in its base units. */
    public Map<String, Double> members(long projectId) {
        return writes.sql().tx(c -> members(c, projectId));
    }

    /**
     * Sets a member's own weight per length (NaN: back to its role's), as one model change. {@code member} is how the
     * audit names it (the member's title); the caller checks that the member exists in the project's derivation.
     */
    public void setMember(Editor who, long projectId, long version, String memberId, String member, double perLength) {
        if (!Double.isNaN(perLength)) com.baysheet.engine.Check.nonNegative("ownWeight", perLength);
        writes.change(who, c -> "own weight of " + member + (Double.isNaN(perLength) ? " cleared (its role's applies)"
                : " set to " + Display.plain(perLength)) + "; was " + Optional.ofNullable(members(c, projectId).get(memberId))
                .map(Display::plain).orElse("its role's"), projectId, version, c -> {
            writeMember(c, projectId, memberId, perLength);
            return null;
        });
    }

    /** A member's own weight (NaN: none), in the caller's change. */
    static void writeMember(Connection c, long projectId, String memberId, double perLength) {
        try (Handle h = Sql.on(c)) {
            h.createUpdate("DELETE FROM member_weight WHERE project_id = :project AND member_id = :member")
                    .bind("project", projectId).bind("member", memberId).execute();
            if (!Double.isNaN(perLength))
                h.createUpdate("INSERT INTO member_weight (project_id, member_id, weight) VALUES (:project, :member, :weight)")
                        .bind("project", projectId).bind("member", memberId).bind("weight", perLength).execute();
        }
    }

    static Map<String, Double> members(Connection c, long projectId) {
        Map<String, Double> out = new LinkedHashMap<>();
        try (Handle h = Sql.on(c)) {
            h.createQuery("SELECT member_id, weight FROM member_weight WHERE project_id = :project ORDER BY member_id")
                    .bind("project", projectId).map((rs, ctx) -> Map.entry(rs.getString(1), rs.getDouble(2)))
                    .forEach(e -> out.put(e.getKey(), e.getValue()));
        }
        return out;
    }

    /** The project's own values (null: the firm's defaults), in the caller's change. */
    static void write(Connection c, long projectId, ProjectSelfWeights w) throws SQLException {
        try (Handle h = Sql.on(c)) {
            h.createUpdate("UPDATE project SET sw_infill_beam = :infillBeam, sw_grid_beam = :gridBeam, sw_girder = :girder, "
                            + "sw_column = :column WHERE id = :project")
                    .bind("infillBeam", w == null ? null : w.infillBeam()).bind("gridBeam", w == null ? null : w.gridBeam())
                    .bind("girder", w == null ? null : w.girder()).bind("column", w == null ? null : w.column())
                    .bind("project", projectId).execute();
        }
    }

    /** The weights the project's members carry, with where they come from. */
    static SelfWeights forProject(Connection c, long projectId, UnitSystem units) throws SQLException {
        Optional<ProjectSelfWeights> own = own(c, projectId);
        SelfWeights byRole = own.map(w -> new SelfWeights(w.infillBeam(), w.gridBeam(), w.girder(), w.column(), "project value"))
                .orElse(firm(c, units));
        return byRole.withMembers(members(c, projectId));
    }

    static Optional<ProjectSelfWeights> own(Connection c, long projectId) throws SQLException {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT sw_infill_beam, sw_grid_beam, sw_girder, sw_column FROM project WHERE id = :project")
                    .bind("project", projectId)
                    .map((rs, ctx) -> rs.getObject(1) == null ? Optional.<ProjectSelfWeights>empty()
                            : Optional.of(new ProjectSelfWeights(rs.getDouble(1), rs.getDouble(2), rs.getDouble(3), rs.getDouble(4))))
                    .findFirst().flatMap(own -> own);
        }
    }

    /** The firm's self weights by role (plf), converted exactly for an SI project; all 0: not included, and said so. */
    static SelfWeights firm(Connection c, UnitSystem units) throws SQLException {
        double k = units == UnitSystem.SI ? Convert.KN_PER_M_PER_PLF : 1;
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT sw_infill_beam, sw_grid_beam, sw_girder, sw_column FROM firm_setting WHERE id = 1")
                    .map((rs, ctx) -> {
                        double i = rs.getDouble(1), g = rs.getDouble(2), gi = rs.getDouble(3), col = rs.getDouble(4);
                        if (i == 0 && g == 0 && gi == 0 && col == 0) return SelfWeights.NONE;
                        return new SelfWeights(i * k, g * k, gi * k, col * k, "firm default");
                    })
                    .findFirst().orElse(SelfWeights.NONE);
        }
    }

    private static String describe(ProjectSelfWeights w) {
        if (w == null) return "the firm's defaults";
        return "infill beams " + Display.plain(w.infillBeam()) + ", grid beams " + Display.plain(w.gridBeam()) + ", girders "
                + Display.plain(w.girder()) + ", columns " + Display.plain(w.column());
    }
}
