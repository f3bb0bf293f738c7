package com.baysheet.framing;

import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.GridPointLoad;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * From a building model to every member and every column take-down. {@link #derive} recomputes the whole
 * building; {@link Rederivation} reuses the levels an earlier derivation framed from equal inputs and takes every
 * column stack down again (docs/engine.md, Derivation and its caches). The result is immutable.
 */
public final class Derivation {
    private Derivation() {}

    /** @throws com.baysheet.engine.InputError naming the level, grid line or bay where the model is wrong */
    public static Derived derive(Building b) {
        return derive(b, new MemberCache(b.context()), null).derived();
    }

    /** A derivation and the framing of each level by its inputs (empty where no earlier levels were offered). */
    record Framed(Derived derived, Map<LevelInputs, LevelFraming> levels) {}

    /**
     * @param earlier levels framed before in a building with the same {@link LevelInputs.Shared} inputs, by their
     *                inputs (null: frame every level and keep no inputs)
     */
    static Framed derive(Building b, MemberCache cache, Map<LevelInputs, LevelFraming> earlier) {
        // before the model check, so that clearing the last bays beneath a line load names the load
        for (var l : b.lineLoads())
            if (b.levels().stream().noneMatch(v -> v.name().equals(l.level())))
                throw new com.baysheet.engine.InputError("lineLoads[" + l.label() + "].level", l.level(),
                        "is not a framed level of the building: the line load \"" + l.label() + "\" needs a member beneath it");
        for (var p : b.pointLoads())
            if (b.levels().stream().noneMatch(v -> v.name().equals(p.level())))
                throw new com.baysheet.engine.InputError("pointLoads[" + p.label() + "].level", p.level(),
                        "is not a framed level of the building: the point load \"" + p.label() + "\" needs a member beneath it");
        ModelCheck.validate(b);
        List<Integer> order = new ArrayList<>();
        for (int k = 0; k < b.levels().size(); k++) order.add(k);
        order.sort(Comparator.comparingDouble((Integer k) -> b.levels().get(k).elevation()).reversed());

        List<LevelPlan> plans = new ArrayList<>();
        List<LevelFraming> framings = new ArrayList<>();
        List<DerivedMember> members = new ArrayList<>();
        Map<LevelInputs, LevelFraming> framed = new LinkedHashMap<>();
        for (int k : order) {
            Level l = b.levels().get(k);
            boolean below = l.elevation() < b.levels().get(order.get(0)).elevation();
            LevelPlan plan = new LevelPlan(l.key() != null ? l.key() : "L" + k, l, b.grid(), below);
            List<GridLineLoad> lines = b.lineLoads().stream().filter(x -> x.level().equals(l.name())).toList();
            List<GridPointLoad> points = b.pointLoads().stream().filter(x -> x.level().equals(l.name())).toList();
            LevelInputs in = earlier == null ? null : LevelInputs.of(b, plan, lines, points);
            LevelFraming f = in == null ? null : earlier.get(in);
            if (f == null) {
                // the level's point loads are checked against the catalogue in the framing, so a reused level was checked too
                f = new LevelFraming(cache, plan, b.selfWeights(), lines, RoofSteps.of(b.context(), plan, b.levels()), points).derive();
            }
            if (in != null) framed.put(in, f);
            plans.add(plan);
            framings.add(f);
            members.addAll(f.members);
        }
        ColumnTakeDown down = new ColumnTakeDown(b.context(), cache, plans, framings, b.selfWeights());
        List<TakeDown> takeDowns = new ArrayList<>();
        for (int i = 0; i < b.grid().x().lines(); i++)
            for (int j = 0; j < b.grid().y().lines(); j++) {
                TakeDown t = down.stack(i, j, members);
                if (t != null) takeDowns.add(t);
            }
        return new Framed(new Derived(b, members, takeDowns), framed);
    }
}
