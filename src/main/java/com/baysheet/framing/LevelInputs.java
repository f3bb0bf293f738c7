package com.baysheet.framing;

import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.GridPointLoad;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Everything one level's framing ({@link LevelFraming}) reads that is the level's own, as a value: two levels with
 * equal inputs, in buildings with equal {@link Shared} inputs, frame into equal members. What it reads of other
 * levels is here too: whether another level is higher (a roof below it is sheltered and may have steps), where
 * the roof steps look at the levels above ({@link RoofSteps#reads}) the cover they find there cell by cell, and for a
 * floor level the bays nothing covers ({@link SkyExposure#openFloorBays}), which its records name.
 *
 * @param planId      the level's id in its members' ids (its key, or its place in the building where it has none)
 * @param ownWeights  the self weights entered for this level's members (ids beginning with the plan id)
 * @param cover       {@link SkyExposure#cover}, row by row; empty where the steps read no other level
 * @param open        the floor level's bays open to the sky and how its records name them
 */
record LevelInputs(String planId, Level level, boolean belowAnother, List<GridLineLoad> lineLoads, List<GridPointLoad> pointLoads,
                   Map<String, Double> ownWeights, List<Double> cover, SkyExposure.Open open) {
    LevelInputs {
        lineLoads = List.copyOf(lineLoads);
        pointLoads = List.copyOf(pointLoads);
        ownWeights = Map.copyOf(ownWeights);
        cover = List.copyOf(cover);
    }

    /**
     * What every level's framing reads of the building as a whole: the calculation setting (edition, units,
     * catalogue, options, snow site), the grid, and the self weights by role with where they come from. A change to
     * any of these changes every level.
     */
    record Shared(com.baysheet.engine.CalcContext context, com.baysheet.framing.model.Grid grid, double infillBeam,
                  double gridBeam, double girder, double column, String origin) {
        static Shared of(Building b) {
            var w = b.selfWeights();
            return new Shared(b.context(), b.grid(), w.infillBeam(), w.gridBeam(), w.girder(), w.column(), w.origin());
        }
    }

    static LevelInputs of(Building b, LevelPlan plan, List<GridLineLoad> lines, List<GridPointLoad> points) {
        String prefix = plan.id + "-";
        Map<String, Double> own = new TreeMap<>();
        b.selfWeights().members().forEach((id, w) -> { if (id.startsWith(prefix)) own.put(id, w); });
        List<Double> cover = new ArrayList<>();
        if (RoofSteps.reads(b.context(), plan))
            for (double[] row : SkyExposure.cover(plan, b.levels())) for (double v : row) cover.add(v);
        return new LevelInputs(plan.id, plan.level, plan.belowAnother, lines, points, own, cover,
                SkyExposure.openFloorBays(plan, b.levels()));
    }
}
