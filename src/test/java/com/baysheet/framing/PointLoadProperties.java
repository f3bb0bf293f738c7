package com.baysheet.framing;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridPointLoad;
import com.baysheet.framing.model.Level;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Point loads in bays and on grid-line members reach the column feet once: over random models, the unreduced dead,
 * floor live and roof live at the feet rise by exactly the point loads added, and every beam stays in equilibrium.
 */
class PointLoadProperties {
    @Property(tries = 120)
    void everyPointLoadReachesTheColumnFeetOnce(@ForAll long seed) {
        Random rnd = new Random(seed);
        Building plain = Buildings.random(seed);
        Derived bare = Derivation.derive(plain);
        List<GridPointLoad> loads = new ArrayList<>();
        double dead = 0, live = 0, roof = 0;
        int n = 0;
        for (Level l : plain.levels())
            for (Bay b : l.bays()) {
                if (b.opening() || rnd.nextDouble() < 0.4) continue;
                double wx = plain.grid().x().spacing(b.col()), wy = plain.grid().y().spacing(b.row());
                // now and then exactly on a beam line, a bay edge or a corner
                double x = rnd.nextDouble() < 0.2 ? wx * rnd.nextInt(2) : wx * rnd.nextDouble();
                double y = rnd.nextDouble() < 0.2 ? wy * rnd.nextInt(b.framing().infillBeams() + 2) / (b.framing().infillBeams() + 1) : wy * rnd.nextDouble();
                double d = 100 + rnd.nextInt(5000), v = rnd.nextBoolean() ? rnd.nextInt(3000) : 0;
                boolean roofLive = rnd.nextBoolean();
                loads.add(GridPointLoad.inBay(l.name(), "unit " + n++, b.col(), b.row(), x, y, d, v, roofLive ? "roof-ordinary" : "office"));
                dead += d;
                if (roofLive) roof += v;
                else live += v;
            }
        for (DerivedMember m : bare.members()) {
            if (m.role() != MemberRole.GIRDER && m.role() != MemberRole.GRID_BEAM || rnd.nextDouble() < 0.7) continue;
            boolean onX = m.plan().x1() == m.plan().x2();
            GridAxis own = onX ? plain.grid().x() : plain.grid().y(), across = onX ? plain.grid().y() : plain.grid().x();
            int line = index(own, onX ? m.plan().x1() : m.plan().y1()), from = index(across, onX ? m.plan().y1() : m.plan().x1());
            boolean backward = rnd.nextBoolean();
            double dist = m.span() * rnd.nextDouble(), d = 100 + rnd.nextInt(8000);
            loads.add(backward ? GridPointLoad.onLine(m.level(), "hung " + n++, onX, line, from + 1, from, dist, d, 0, null)
                    : GridPointLoad.onLine(m.level(), "hung " + n++, onX, line, from, from + 1, dist, d, 0, null));
            dead += d;
        }
        Derived d = Derivation.derive(plain.withPointLoads(loads));
        double[] before = feet(bare), after = feet(d);
        assertThat(after[0] - before[0]).as("dead, seed %d", seed).isCloseTo(dead, within(1e-9 * Math.max(1, before[0] + dead)));
        assertThat(after[1] - before[1]).as("floor live, seed %d", seed).isCloseTo(live, within(1e-9 * Math.max(1, before[1] + live)));
        assertThat(after[2] - before[2]).as("roof live, seed %d", seed).isCloseTo(roof, within(1e-9 * Math.max(1, before[2] + roof)));
        // no member is made or renamed by a point load
        assertThat(d.members().stream().map(DerivedMember::name).toList()).isEqualTo(bare.members().stream().map(DerivedMember::name).toList());
    }

    /** {dead, floor live unreduced, roof live unreduced} summed over the feet of all stacks. */
    private static double[] feet(Derived d) {
        Map<String, DerivedMember> byId = new java.util.HashMap<>();
        for (DerivedMember m : d.members()) byId.put(m.id(), m);
        double[] out = new double[3];
        for (TakeDown t : d.takeDowns()) {
            TakeDown.Row foot = t.rows().get(t.rows().size() - 1);
            out[0] += foot.dead();
            out[1] += foot.liveUnreduced();
            double r = byId.get(foot.member()).result().record().result("Lr0.P");
            out[2] += Double.isNaN(r) ? 0 : r;
        }
        return out;
    }

    private static int index(GridAxis a, double v) {
        for (int i = 0; i < a.lines(); i++) if (Math.abs(a.position(i) - v) < 1e-9) return i;
        throw new AssertionError(v);
    }
}
