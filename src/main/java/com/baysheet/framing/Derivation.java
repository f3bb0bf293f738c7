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
        return derive(b, new MemberCache(b.context()), null, Map.of(), null, List.of()).derived();
    }

    /**
     * A derivation, the framing of each level by its inputs and each grid point's stack with its inputs (empty where
     * nothing earlier was offered), and the framings level by level from the top.
     */
    record Framed(Derived derived, Map<LevelInputs, LevelFraming> levels, Map<Integer, Stack> stacks, List<LevelFraming> order) {}

    /** One grid point's take-down (null where no level frames into it) and its columns, and what they were taken from. */
    record Stack(StackInputs inputs, TakeDown takeDown, List<DerivedMember> columns) {}

    /**
     * @param earlier levels framed before in a building with the same {@link LevelInputs.Shared} inputs, by their
     *                inputs (null: frame every level and keep no inputs)
     * @param stacks  the stacks taken down before in that building, by grid point
     * @param before  that building's derivation, whose members a part derived again keeps where they come out the same (null: none)
     * @param framedBefore that derivation's framings, level by level from the top (empty: none)
     */
    static Framed derive(Building b, MemberCache cache, Map<LevelInputs, LevelFraming> earlier, Map<Integer, Stack> stacks, Derived before,
                         List<LevelFraming> framedBefore) {
        SameMembers unchanged = new SameMembers(before);
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
        List<List<DerivedMember>> parts = new ArrayList<>();
        Map<LevelInputs, LevelFraming> framed = new LinkedHashMap<>();
        GridNames names = new GridNames(b.grid());
        Map<TypicalFloor.Shape, Integer> typical = new java.util.HashMap<>(); // the first plain level of each shape, by place
        for (int k : order) {
            Level l = b.levels().get(k);
            boolean below = l.elevation() < b.levels().get(order.get(0)).elevation();
            LevelPlan plan = new LevelPlan(l.key() != null ? l.key() : "L" + k, l, b.grid(), below, names);
            List<GridLineLoad> lines = b.lineLoads().stream().filter(x -> x.level().equals(l.name())).toList();
            List<GridPointLoad> points = b.pointLoads().stream().filter(x -> x.level().equals(l.name())).toList();
            LevelInputs in = earlier == null ? null : LevelInputs.of(b, plan, lines, points);
            LevelFraming f = in == null ? null : earlier.get(in);
            if (f == null) {
                RoofSteps steps = RoofSteps.of(b.context(), plan, b.levels());
                SkyExposure.Open open = SkyExposure.openFloorBays(plan, b.levels());
                var shape = TypicalFloor.plain(plan, !lines.isEmpty() || !points.isEmpty(), steps, open, b.selfWeights())
                        ? TypicalFloor.Shape.of(plan) : null;
                Integer same = shape == null ? null : typical.get(shape);
                if (same != null) f = TypicalFloor.as(framings.get(same), plans.get(same), plan);
                else {
                    // the level's point loads are checked against the catalogue in the framing, so a reused level was checked too
                    f = new LevelFraming(cache, plan, b.selfWeights(), lines, steps, points, open).derive();
                    if (shape != null) typical.put(shape, plans.size());
                }
                unchanged.keep(f.members, 0);
            }
            if (in != null) framed.put(in, f);
            plans.add(plan);
            framings.add(f);
            members.addAll(f.members);
            if (!f.members.isEmpty()) parts.add(f.part());
        }
        ColumnTakeDown down = new ColumnTakeDown(b.context(), cache, plans, framings, b.selfWeights());
        // the levels not framed by the very framing the same level had before: only there can a kept stack read otherwise
        List<Integer> anew = null;
        if (framedBefore.size() == framings.size()) {
            anew = new ArrayList<>();
            for (int k = 0; k < framings.size(); k++) if (framings.get(k) != framedBefore.get(k)) anew.add(k);
        }
        List<TakeDown> takeDowns = new ArrayList<>();
        Map<Integer, Stack> taken = new java.util.HashMap<>();
        int ny = b.grid().y().lines();
        for (int i = 0; i < b.grid().x().lines(); i++)
            for (int j = 0; j < ny; j++) {
                Stack was = earlier == null ? null : stacks.get(i * ny + j);
                StackInputs in;
                if (was != null && anew != null && was.inputs().sameAt(plans, framings, b.selfWeights(), i, j, anew)) in = was.inputs();
                else in = earlier == null ? null : StackInputs.of(plans, framings, b.selfWeights(), i, j);
                if (was == null || !was.inputs().equals(in)) {
                    int first = members.size();
                    TakeDown t = down.stack(i, j, members);
                    unchanged.keep(members, first);
                    was = new Stack(in, t, List.copyOf(members.subList(first, members.size())));
                } else members.addAll(was.columns());
                if (!was.columns().isEmpty()) parts.add(was.columns());
                if (was.takeDown() != null) takeDowns.add(was.takeDown());
                if (in != null) taken.put(i * ny + j, was);
            }
        return new Framed(Derived.ofParts(b, parts, takeDowns, before), framed, taken, List.copyOf(framings));
    }
}
