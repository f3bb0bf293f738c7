package com.baysheet.framing;

import com.baysheet.engine.member.EndShare;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.SelfWeights;

import java.util.ArrayList;
import java.util.List;

/**
 * Everything {@link ColumnTakeDown#stack} reads at one grid point that is not shared by the whole building, level
 * by level from the top down: the level's id, name, elevation (the storey heights) and roof slope, the four bays
 * around the point (the column's place and its bays and outline), the end shares arriving there, any self
 * weight entered for the column, and the caution naming the level's bays open to the sky where one is around it. Two stacks with equal inputs, in buildings with equal shared inputs, are equal.
 */
record StackInputs(List<AtLevel> levels) {
    StackInputs { levels = List.copyOf(levels); }

    record AtLevel(String planId, String level, double elevation, double roofSlope, Bay sw, Bay se, Bay nw, Bay ne,
                   List<EndShare> shares, Double ownWeight, List<String> openToSky) {}

    static StackInputs of(List<LevelPlan> plans, List<LevelFraming> framings, SelfWeights weights, int i, int j) {
        List<AtLevel> out = new ArrayList<>(plans.size());
        for (int k = 0; k < plans.size(); k++) out.add(at(plans, framings, weights, i, j, k));
        return new StackInputs(out);
    }

    /**
     * Whether these inputs are the stack's at grid point (i, j) of {@code plans} and {@code framings}, given that they
     * are at every level but those {@code anew}: where a level's framing is the very one the same level had when these
     * inputs were read (a framing reused for equal level inputs), what the stack reads there is equal too.
     */
    boolean sameAt(List<LevelPlan> plans, List<LevelFraming> framings, SelfWeights weights, int i, int j, List<Integer> anew) {
        if (levels.size() != plans.size()) return false;
        for (int k : anew) if (!at(plans, framings, weights, i, j, k).equals(levels.get(k))) return false;
        return true;
    }

    private static AtLevel at(List<LevelPlan> plans, List<LevelFraming> framings, SelfWeights weights, int i, int j, int k) {
        LevelPlan p = plans.get(k);
        List<EndShare> shares = framings.get(k).atPoint[i][j];
        return new AtLevel(p.id, p.level.name(), p.level.elevation(), p.level.roofSlope(), p.floored(i - 1, j - 1),
                p.floored(i, j - 1), p.floored(i - 1, j), p.floored(i, j), shares == null ? null : List.copyOf(shares),
                weights.members().get(p.id + "-c" + p.at(i, j)),
                shares == null ? List.of() : framings.get(k).openAmong(ColumnTakeDown.bays(p, i, j)));
    }
}
