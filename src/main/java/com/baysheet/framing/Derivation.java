package com.baysheet.framing;

import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * From a building model to every member and every column take-down. The whole building is recomputed on
 * each call (see docs/benchmarks.md for why that is fast enough); the result is immutable.
 */
public final class Derivation {
    private Derivation() {}

    /** @throws com.baysheet.engine.InputError naming the level, grid line or bay where the model is wrong */
    public static Derived derive(Building b) {
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
        MemberCache cache = new MemberCache(b.context());
        for (int k : order) {
            Level l = b.levels().get(k);
            boolean below = l.elevation() < b.levels().get(order.get(0)).elevation();
            LevelPlan plan = new LevelPlan(l.key() != null ? l.key() : "L" + k, l, b.grid(), below);
            LevelFraming f = new LevelFraming(cache, plan, b.selfWeights(),
                    b.lineLoads().stream().filter(x -> x.level().equals(l.name())).toList(),
                    RoofSteps.of(b.context(), plan, b.levels()),
                    b.pointLoads().stream().filter(x -> x.level().equals(l.name())).toList(),
                    SkyExposure.openFloorBays(plan, b.levels())).derive();
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
        return new Derived(b, members, takeDowns);
    }
}
