package com.baysheet.framing;

import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.SelfWeights;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Conservation with self weight and line loads over random models: the unfactored dead load at the column
 * feet is the bays' dead load × area + every line load × its length + every beam's and girder's self weight ×
 * its span + every column's self weight × its storey height.
 */
class GravityLoadProperties {
    @Property(tries = 120)
    void deadLoadAtTheFeetIsEverythingPutOnTheBuilding(@ForAll long seed) {
        Random rnd = new Random(seed);
        Building plain = Buildings.random(seed);
        Derived bare = Derivation.derive(plain);
        SelfWeights w = new SelfWeights(rnd.nextInt(60), rnd.nextInt(60), rnd.nextInt(120), rnd.nextInt(200), "firm default");
        List<GridLineLoad> lines = new ArrayList<>();
        double lineTotal = 0;
        int n = 0;
        for (DerivedMember m : bare.members()) {
            if (m.role() != MemberRole.GIRDER && m.role() != MemberRole.GRID_BEAM || rnd.nextDouble() < 0.5) continue;
            boolean onX = m.plan().x1() == m.plan().x2(); // a member along an x line runs north-south
            int line = index(onX ? positions(plain.grid().x()) : positions(plain.grid().y()), onX ? m.plan().x1() : m.plan().y1());
            int from = index(onX ? positions(plain.grid().y()) : positions(plain.grid().x()), onX ? m.plan().y1() : m.plan().x1());
            double dead = 1 + rnd.nextInt(400);
            lines.add(GridLineLoad.dead(m.level(), onX, line, from, from + 1, "line " + n++, dead));
            lineTotal += dead * m.span();
        }
        Building b = plain.withSelfWeights(w).withLineLoads(lines);
        Derived d = Derivation.derive(b);
        double expected = 0;
        for (Level l : b.levels()) expected += DerivationProperties.deadLoad(b, l);
        expected += lineTotal;
        List<Level> byElevation = new ArrayList<>(b.levels());
        byElevation.sort(Comparator.comparingDouble(Level::elevation));
        for (DerivedMember m : d.members()) {
            switch (m.role()) {
                case INFILL_BEAM -> expected += w.infillBeam() * m.span();
                case GRID_BEAM -> expected += w.gridBeam() * m.span();
                case GIRDER -> expected += w.girder() * m.span();
                case COLUMN -> expected += w.column() * storeyBelow(byElevation, m.level());
            }
        }
        double feet = 0;
        for (TakeDown t : d.takeDowns()) feet += t.rows().get(t.rows().size() - 1).dead();
        assertThat(feet).as("seed %d", seed).isCloseTo(expected, within(1e-9 * Math.max(1, expected)));
    }

    /** The column below a level runs to the next level down, or from the lowest level to elevation 0. */
    static double storeyBelow(List<Level> ascending, String level) {
        for (int k = 0; k < ascending.size(); k++)
            if (ascending.get(k).name().equals(level))
                return k == 0 ? Math.max(0, ascending.get(0).elevation()) : ascending.get(k).elevation() - ascending.get(k - 1).elevation();
        throw new AssertionError(level);
    }

    static double[] positions(com.baysheet.framing.model.GridAxis a) {
        double[] p = new double[a.lines()];
        for (int i = 0; i < p.length; i++) p[i] = a.position(i);
        return p;
    }

    static int index(double[] p, double v) {
        for (int i = 0; i < p.length; i++) if (Math.abs(p[i] - v) < 1e-9) return i;
        throw new AssertionError(v);
    }
}
