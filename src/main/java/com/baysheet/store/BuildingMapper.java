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
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Builds a project's {@link Building} from the store: context, grid (with its stable line ids) and the levels
 * that have a floor, each keyed "L" + its row id, so member ids follow the level and the lines, not their places,
 * and the line loads, their stable line ids turned into the grid's positions.
 */
final class BuildingMapper {
    private BuildingMapper() {}

    static Model load(Connection c, long projectId) throws SQLException {
        return load(c, projectId, null, null);
    }

    /**
     * The model as {@link #load(Connection, long)} reads it, where {@code was} is the model as it stood before a change
     * that wrote bays of the levels {@code baysWritten} names and of no other: every other level's bays are as {@code was}
     * holds them, and are taken from it, not read (in a grid unchanged; a level whose name, height and link are
     * unchanged too is the very level of {@code was}). With either null every level's bays are read.
     */
    static Model load(Connection c, long projectId, Model was, Set<Long> baysWritten) throws SQLException {
        Project p = ProjectStore.find(c, projectId);
        CalcContext ctx = new CalcContext(Editions.builtIn().get(p.info().edition()), p.info().units(),
                OccupancyStore.catalogue(c), p.info().options(), p.info().snow(), p.info().floorMethod());
        List<StoredLevel> stored = LevelStore.findByProject(c, projectId);
        List<Level> levels = new ArrayList<>();
        List<String> unframed = new ArrayList<>();
        Grid grid = GridStore.find(c, projectId);
        Held held = was == null || baysWritten == null || !was.building().grid().equals(grid) ? Held.NONE : Held.of(was);
        for (StoredLevel s : stored) {
            // a typical level's bays are its typical's (TypicalLevels); its members keep its own key and elevation
            long source = TypicalLevels.baysOf(s);
            Level same = baysWritten == null || baysWritten.contains(source) ? null : held.level(s);
            if (same != null) {
                levels.add(same);
                continue;
            }
            List<Bay> kept = baysWritten == null || baysWritten.contains(source) ? null : held.bays.get(source);
            List<Bay> bays = kept != null ? kept : BayStore.findByLevel(c, source, grid);
            if (bays.stream().allMatch(Bay::opening)) unframed.add(s.name());
            else levels.add(level(s.info(), bays).withKey("L" + s.id()));
        }
        // every level's line loads, an unframed level's too: the derivation refuses those, so clearing the bays
        // beneath a load is refused rather than leaving the load carried by nothing
        Building b = new Building(p.info().name(), ctx, grid, levels).withSelfWeights(SelfWeightStore.forProject(c, projectId, p.info().units()))
                .withLineLoads(LineLoadStore.forBuilding(c, grid, stored)).withPointLoads(PointLoadStore.forBuilding(c, grid, stored));
        return new Model(p, OccupancyStore.catalogueVersion(c), b, stored, unframed, Results.firmVersion(c));
    }

    /** What a model held of its levels: each framed level by its row, and the bays by the level whose bays they are. */
    private record Held(Map<Long, StoredLevel> stored, Map<Long, Level> levels, Map<Long, List<Bay>> bays) {
        static final Held NONE = new Held(Map.of(), Map.of(), Map.of());

        static Held of(Model m) {
            Map<String, Level> byKey = new HashMap<>();
            for (Level l : m.building().levels()) byKey.put(l.key(), l);
            Map<Long, StoredLevel> stored = new HashMap<>();
            Map<Long, Level> levels = new HashMap<>();
            Map<Long, List<Bay>> bays = new HashMap<>();
            for (StoredLevel s : m.levels()) {
                Level l = byKey.get("L" + s.id());
                if (l == null) continue; // unframed: its bays, all openings, are read again
                stored.put(s.id(), s);
                levels.put(s.id(), l);
                bays.putIfAbsent(TypicalLevels.baysOf(s), l.bays());
            }
            return new Held(stored, levels, bays);
        }

        /** The level held for {@code s}, where it stands as it was (name, height, roof and link). */
        Level level(StoredLevel s) {
            StoredLevel w = stored.get(s.id());
            return w != null && w.equals(s) ? levels.get(s.id()) : null;
        }
    }

    private static Level level(LevelInfo l, List<Bay> bays) {
        return l.roof() ? Level.roof(l.name(), l.elevation(), l.roofSlope(), bays).withSurface(l.surface())
                : Level.floor(l.name(), l.elevation(), bays);
    }
}
