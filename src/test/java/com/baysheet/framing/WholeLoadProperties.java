package com.baysheet.framing;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.GridPointLoad;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.SelfWeights;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Every kind of gravity load at once, over random models: the bays' dead load, line loads on grid-line members,
 * point loads in bays and on members, the members' self weights by role with some members given their own, and
 * the columns' own weight storey by storey. The unfactored dead load at the column feet is the sum of all of them,
 * each counted once (statics: every load path ends at a foot and nothing is made or lost on the way), and the
 * unreduced floor live load at the feet rises by exactly the live point loads added.
 */
class WholeLoadProperties {
    @Property(tries = 100)
    void everyAppliedLoadReachesTheFeetOnceWhenAllKindsAreTogether(@ForAll long seed) {
        Random rnd = new Random(seed);
        Building plain = Buildings.random(seed);
        Derived bare = Derivation.derive(plain);
        double expected = 0, live = 0;
        for (Level l : plain.levels()) expected += DerivationProperties.deadLoad(plain, l);

        List<GridLineLoad> lines = new ArrayList<>();
        List<GridPointLoad> points = new ArrayList<>();
        Map<String, Double> own = new HashMap<>();
        int n = 0;
        for (DerivedMember m : bare.members()) {
            if (m.role() == MemberRole.COLUMN) {
                if (rnd.nextDouble() < 0.3) own.put(m.id(), (double) rnd.nextInt(300));
                continue;
            }
            if (rnd.nextDouble() < 0.2) own.put(m.id(), (double) rnd.nextInt(150));
            if (m.role() == MemberRole.INFILL_BEAM) continue;
            boolean onX = m.plan().x1() == m.plan().x2();
            double[] along = GravityLoadProperties.positions(onX ? plain.grid().x() : plain.grid().y()), across = GravityLoadProperties.positions(onX ? plain.grid().y() : plain.grid().x());
            int line = GravityLoadProperties.index(along, onX ? m.plan().x1() : m.plan().y1()), from = GravityLoadProperties.index(across, onX ? m.plan().y1() : m.plan().x1());
            if (rnd.nextDouble() < 0.4) {
                double w = 1 + rnd.nextInt(400);
                lines.add(GridLineLoad.dead(m.level(), onX, line, from, from + 1, "line " + n++, w));
                expected += w * m.span();
            }
            if (rnd.nextDouble() < 0.3) {
                double p = 100 + rnd.nextInt(6000);
                points.add(GridPointLoad.onLine(m.level(), "hung " + n++, onX, line, from, from + 1, m.span() * rnd.nextDouble(), p, 0, null));
                expected += p;
            }
        }
        for (Level l : plain.levels())
            for (Bay b : l.bays()) {
                if (b.opening() || l.roof() || rnd.nextDouble() < 0.5) continue;
                double x = plain.grid().x().spacing(b.col()) * rnd.nextDouble(), y = plain.grid().y().spacing(b.row()) * rnd.nextDouble();
                double p = 100 + rnd.nextInt(5000), v = rnd.nextBoolean() ? rnd.nextInt(3000) : 0;
                points.add(GridPointLoad.inBay(l.name(), "unit " + n++, b.col(), b.row(), x, y, p, v, "office"));
                expected += p;
                live += v;
            }
        SelfWeights w = new SelfWeights(rnd.nextInt(60), rnd.nextInt(60), rnd.nextInt(120), rnd.nextInt(200), "firm default")
                .withMembers(own);
        Building b = plain.withSelfWeights(w).withLineLoads(lines).withPointLoads(points);
        Derived d = Derivation.derive(b);

        List<Level> byElevation = new ArrayList<>(b.levels());
        byElevation.sort(Comparator.comparingDouble(Level::elevation));
        for (DerivedMember m : d.members()) {
            double role = switch (m.role()) {
                case INFILL_BEAM -> w.infillBeam();
                case GRID_BEAM -> w.gridBeam();
                case GIRDER -> w.girder();
                case COLUMN -> w.column();
            };
            double perLength = w.of(m.id(), role);
            expected += m.role() == MemberRole.COLUMN ? perLength * GravityLoadProperties.storeyBelow(byElevation, m.level()) : perLength * m.span();
        }
        double feetDead = 0, feetLive = 0, bareLive = 0;
        for (TakeDown t : d.takeDowns()) {
            TakeDown.Row foot = t.rows().get(t.rows().size() - 1);
            feetDead += foot.dead();
            feetLive += foot.liveUnreduced();
        }
        for (TakeDown t : bare.takeDowns()) bareLive += t.rows().get(t.rows().size() - 1).liveUnreduced();
        assertThat(feetDead).as("dead, seed %d", seed).isCloseTo(expected, within(1e-9 * Math.max(1, expected)));
        assertThat(feetLive - bareLive).as("floor live, seed %d", seed).isCloseTo(live, within(1e-9 * Math.max(1, bareLive + live)));
        // the members are those of the plain model: loads and weights make and rename none
        assertThat(d.members().stream().map(DerivedMember::id).toList()).isEqualTo(bare.members().stream().map(DerivedMember::id).toList());
    }
}
