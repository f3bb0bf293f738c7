package com.baysheet.framing;

import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * What covers each grid cell of a level from above: a bay of a level is exposed (open to the sky) where no higher
 * level has a floored bay over it. The one test for both a roof's steps ({@link RoofSteps}) and a floor level's bays
 * that carry no roof load although nothing covers them ({@link #openFloorBays}).
 */
final class SkyExposure {
    private SkyExposure() {}

    /** The highest elevation of a floored bay of a level above {@code plan}'s over each cell; NaN where none. */
    static double[][] cover(LevelPlan plan, List<Level> all) {
        int nx = plan.xCells(), ny = plan.yCells();
        double[][] top = new double[nx][ny];
        for (double[] row : top) Arrays.fill(row, Double.NaN);
        for (Level l : all) {
            if (l.elevation() <= plan.level.elevation()) continue;
            LevelPlan p = new LevelPlan("", l, plan.grid);
            for (int c = 0; c < nx; c++)
                for (int r = 0; r < ny; r++)
                    if (p.floored(c, r) != null && !(top[c][r] >= l.elevation())) top[c][r] = l.elevation();
        }
        return top;
    }

    /** The floored bays of {@code plan} that nothing covers, indexed [col][row]. */
    static boolean[][] exposed(LevelPlan plan, double[][] cover) {
        boolean[][] out = new boolean[plan.xCells()][plan.yCells()];
        for (int c = 0; c < out.length; c++)
            for (int r = 0; r < out[0].length; r++) out[c][r] = plan.floored(c, r) != null && Double.isNaN(cover[c][r]);
        return out;
    }

    /**
     * The names of a floor level's (not a roof's) bays open to the sky, in grid order; none for a roof. Such a bay
     * carries the floor's own occupancy only: no roof live load and no snow.
     */
    static List<String> openFloorBays(LevelPlan plan, List<Level> all) {
        if (plan.level.roof()) return List.of();
        boolean[][] open = exposed(plan, cover(plan, all));
        List<String> out = new ArrayList<>();
        for (int r = 0; r < open[0].length; r++)
            for (int c = 0; c < open.length; c++) if (open[c][r]) out.add(plan.grid.bayName(c, r));
        return out;
    }
}
