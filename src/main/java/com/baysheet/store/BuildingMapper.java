package com.baysheet.store;

import com.baysheet.engine.code.Editions;
import com.baysheet.engine.reduction.CalcContext;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

/** Builds a project's {@link Building} from the store: context, grid and the levels that have a floor. */
final class BuildingMapper {
    private BuildingMapper() {}

    static Model load(Connection c, long projectId) throws SQLException {
        Project p = ProjectStore.find(c, projectId);
        CalcContext ctx = new CalcContext(Editions.builtIn().get(p.info().edition()), p.info().units(),
                OccupancyStore.catalogue(c), p.info().options());
        List<StoredLevel> stored = LevelStore.findByProject(c, projectId);
        List<Level> levels = new ArrayList<>();
        List<String> unframed = new ArrayList<>();
        for (StoredLevel s : stored) {
            List<Bay> bays = BayStore.findByLevel(c, s.id());
            if (bays.stream().allMatch(Bay::opening)) unframed.add(s.name());
            else levels.add(level(s.info(), bays));
        }
        Building b = new Building(p.info().name(), ctx, GridStore.find(c, projectId), levels);
        return new Model(p, OccupancyStore.catalogueVersion(c), b, stored, unframed);
    }

    private static Level level(LevelInfo l, List<Bay> bays) {
        return l.roof() ? Level.roof(l.name(), l.elevation(), l.roofSlope(), bays)
                : Level.floor(l.name(), l.elevation(), bays);
    }
}
