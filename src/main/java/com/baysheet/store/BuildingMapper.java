package com.baysheet.store;

import com.baysheet.engine.code.Editions;
import com.baysheet.engine.CalcContext;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;

import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.SelfWeights;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.Model;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
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
                OccupancyStore.catalogue(c), p.info().options(), p.info().snow(), p.info().floorMethod());
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
        Building b = new Building(p.info().name(), ctx, grid, levels).withSelfWeights(SelfWeightStore.forProject(c, projectId, p.info().units()))
                .withLineLoads(LineLoadStore.forBuilding(c, grid, stored)).withPointLoads(PointLoadStore.forBuilding(c, grid, stored));
        return new Model(p, OccupancyStore.catalogueVersion(c), b, stored, unframed, Results.firmVersion(c));
    }

    private static Level level(LevelInfo l, List<Bay> bays) {
        return l.roof() ? Level.roof(l.name(), l.elevation(), l.roofSlope(), bays).withSurface(l.surface())
                : Level.floor(l.name(), l.elevation(), bays);
    }
}
