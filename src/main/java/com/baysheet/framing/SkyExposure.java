package com.baysheet.framing;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

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
            // the level's floored bays as they are listed (a validated level gives each cell once, inside the grid)
            for (Bay b : l.bays()) {
                int c = b.col(), r = b.row();
                if (!b.opening() && c < nx && r < ny && !(top[c][r] >= l.elevation())) top[c][r] = l.elevation();
            }
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
     * A floor level's bays open to the sky ({@code bays}, by name) and how the records name them ({@code phrase}:
     * "every bay of F2", or "bays A-B/1-2, B-C/1-2 of F1" in grid order). The phrase is the level's, the same on
     * every member that carries one of its open bays, so identical members stay one calculation and one typical mark.
     */
    record Open(Set<String> bays, String phrase) {
        static final Open NONE = new Open(Set.of(), "");

        /** The phrase, where any of a member's tributary {@code carried} bays is open; else nothing. */
        List<String> among(List<String> carried) {
            if (bays.isEmpty()) return List.of();
            for (String b : carried) if (bays.contains(b)) return List.of(phrase);
            return List.of();
        }

        /** The phrase, where the one bay {@code carried} is open; else nothing. */
        List<String> among(String carried) {
            return !bays.isEmpty() && bays.contains(carried) ? List.of(phrase) : List.of();
        }
    }

    /**
     * The bays of a floor level (not a roof) that nothing covers; none for a roof. Such a bay carries the floor's own
     * occupancy only: no roof live load and no snow.
     */
    static Open openFloorBays(LevelPlan plan, List<Level> all) {
        if (plan.level.roof()) return Open.NONE;
        boolean[][] open = exposed(plan, cover(plan, all));
        List<String> names = new ArrayList<>();
        int floored = 0;
        for (int r = 0; r < open[0].length; r++)
            for (int c = 0; c < open.length; c++) {
                if (plan.floored(c, r) != null) floored++;
                if (open[c][r]) names.add(plan.bayName(c, r));
            }
        if (names.isEmpty()) return Open.NONE;
        String phrase = names.size() == floored ? "every bay of " + plan.level.name()
                : (names.size() == 1 ? "bay " : "bays ") + String.join(", ", names) + " of " + plan.level.name();
        return new Open(Set.copyOf(names), phrase);
    }
}
