package com.baysheet.store;

import com.baysheet.engine.code.Editions;
import com.baysheet.engine.reduction.CalcContext;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;

import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.SelfWeights;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

/**
 * Builds a project's {@link Building} from the store: context, grid (with its stable line ids) and the levels
 * that have a floor, each keyed "L" + its row id, so member ids follow the level and the lines, not their places,
 * and the line loads, their stable line ids turned into the grid's positions.
 */
final class BuildingMapper {
    private BuildingMapper() {}

    static Model load(Connection c, long projectId) throws SQLException {
        Project p = ProjectStore.find(c, projectId);
        CalcContext ctx = new CalcContext(Editions.builtIn().get(p.info().edition()), p.info().units(),
                OccupancyStore.catalogue(c), p.info().options(), p.info().snow());
        List<StoredLevel> stored = LevelStore.findByProject(c, projectId);
        List<Level> levels = new ArrayList<>();
        List<String> unframed = new ArrayList<>();
        Grid grid = GridStore.find(c, projectId);
        for (StoredLevel s : stored) {
            // a typical level's bays are its typical's (TypicalLevels); its members keep its own key and elevation
            List<Bay> bays = BayStore.findByLevel(c, TypicalLevels.baysOf(s), grid);
            if (bays.stream().allMatch(Bay::opening)) unframed.add(s.name());
            else levels.add(level(s.info(), bays).withKey("L" + s.id()));
        }
        // every level's line loads, an unframed level's too: the derivation refuses those, so clearing the bays
        // beneath a load is refused rather than leaving the load carried by nothing
        Building b = new Building(p.info().name(), ctx, grid, levels).withSelfWeights(selfWeights(c, p.info().units()))
                .withLineLoads(LineLoadStore.forBuilding(c, grid, stored));
        return new Model(p, OccupancyStore.catalogueVersion(c), b, stored, unframed, Results.firmVersion(c));
    }

    /** The firm's self weights by role (plf), converted exactly for an SI project; all 0: not included, and said so. */
    static SelfWeights selfWeights(Connection c, UnitSystem units) throws SQLException {
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

    private static Level level(LevelInfo l, List<Bay> bays) {
        return l.roof() ? Level.roof(l.name(), l.elevation(), l.roofSlope(), bays).withSurface(l.surface())
                : Level.floor(l.name(), l.elevation(), bays);
    }
}
