package com.baysheet.framing;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;

import java.util.HashSet;
import java.util.Map;
import java.util.Set;

/**
 * Whole-model checks that no single record can make: bays inside the grid and not given twice, a floor on
 * every level, known occupancies, cantilevers only past the building edge, a slope where a roof load acts.
 * Each error names the level and the bay.
 */
public final class ModelCheck {
    private ModelCheck() {}

    public static void validate(Building b) {
        if (b.levels().isEmpty()) throw new InputError("levels", 0, "a building needs at least one level");
        Set<String> names = new HashSet<>();
        Set<Double> elevations = new HashSet<>();
        GridNames bayNames = new GridNames(b.grid()); // written once, not once a level
        for (Level l : b.levels()) {
            if (!names.add(l.name())) throw new InputError("levels", l.name(), "two levels have this name");
            if (!elevations.add(l.elevation()))
                throw new InputError("levels[" + l.name() + "].elevation", l.elevation(), "another level has this elevation");
            level(b, l, bayNames);
        }
    }

    private static void level(Building b, Level l, GridNames bayNames) {
        Grid g = b.grid();
        String at = "levels[" + l.name() + "]";
        // a bay's name is written only for a message: a tall building checks thousands of bays a save
        boolean[] cells = new boolean[g.x().cells() * g.y().cells()];
        boolean anyFloor = false, anyCantilever = false;
        for (Bay bay : l.bays()) {
            if (bay.col() >= g.x().cells() || bay.row() >= g.y().cells())
                throw new InputError(at + ".bays[" + bay.col() + "," + bay.row() + "]", bay.col() + "," + bay.row(),
                        "bay lies outside the grid (" + g.x().cells() + " × " + g.y().cells() + " bays)");
            int cell = bay.row() * g.x().cells() + bay.col();
            if (cells[cell]) {
                String name = bayNames.bay(bay.col(), bay.row());
                throw new InputError(at + ".bays[" + name + "]", name, "bay given twice on this level");
            }
            cells[cell] = true;
            if (bay.opening()) continue;
            anyFloor = true;
            if (!b.context().catalogue().contains(bay.occupancy()))
                throw new InputError(at + ".bays[" + bayNames.bay(bay.col(), bay.row()) + "].occupancy", bay.occupancy(), "is not in the occupancy catalogue");
            if (b.context().catalogue().get(bay.occupancy()).isRoof() && Double.isNaN(l.roofSlope()))
                throw new InputError(at + ".roofSlope", "nothing", "is required: bay " + bayNames.bay(bay.col(), bay.row()) + " carries a roof live load");
            if (!bay.cantilevers().isEmpty() || bay.cantileverOccupancy() != null) {
                anyCantilever |= !bay.cantilevers().isEmpty();
                cantileverUse(b, l, bay, at + ".bays[" + bayNames.bay(bay.col(), bay.row()) + "]");
            }
        }
        if (!anyFloor) throw new InputError(at + ".bays", l.bays().size(), "level " + l.name() + " has no floor at all");
        if (!anyCantilever) return;
        LevelPlan plan = new LevelPlan("", l, g);
        for (Bay bay : l.bays()) {
            for (Map.Entry<Side, Double> c : bay.cantilevers().entrySet()) {
                if (plan.across(bay, c.getKey()) != null)
                    throw new InputError(at + ".bays[" + g.bayName(bay.col(), bay.row()) + "].cantilevers." + c.getKey().name().toLowerCase(),
                            c.getValue(), "a cantilever slab must project past the building edge, not over the next bay");
            }
        }
    }

    /** The occupancy of a bay's cantilever slabs must be known, and a roof load there needs the level's slope. */
    private static void cantileverUse(Building b, Level l, Bay bay, String at) {
        if (bay.cantilevers().isEmpty() && bay.cantileverOccupancy() == null) return;
        String use = bay.cantileverUse(b.context().catalogue());
        if (!b.context().catalogue().contains(use))
            throw new InputError(at + ".cantileverOccupancy", use, "is not in the occupancy catalogue");
        if (b.context().catalogue().get(use).isRoof() && Double.isNaN(l.roofSlope()))
            throw new InputError("levels[" + l.name() + "].roofSlope", "nothing", "is required: a cantilever slab carries a roof live load");
    }
}
