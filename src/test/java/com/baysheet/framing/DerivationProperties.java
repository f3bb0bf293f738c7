package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static com.baysheet.framing.Buildings.areaByUse;
import static com.baysheet.framing.Buildings.flooredArea;
import static com.baysheet.framing.Loads.floorLive;
import static com.baysheet.framing.Loads.roofLive;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Invariants of the derivation over random models (see {@link Buildings#random}): areas, load path and
 * equilibrium. Each property takes a seed so a failure names the model that broke it.
 */
class DerivationProperties {
    private static final double REL = 1e-9;

    private static double tol(double magnitude) { return REL * Math.max(1, Math.abs(magnitude)); }

    @Property(tries = 150)
    void beamDirectAreasOnALevelSumToItsFlooredArea(@ForAll long seed) {
        Building b = Buildings.random(seed);
        Derived d = Derivation.derive(b);
        for (Level l : b.levels()) {
            double direct = d.onLevel(l.name()).stream().filter(m -> m.role() != MemberRole.COLUMN)
                    .mapToDouble(DerivedMember::directArea).sum();
            double floored = flooredArea(b.grid(), l);
            assertThat(direct).as("level %s, seed %d", l.name(), seed).isCloseTo(floored, within(tol(floored)));
        }
    }

    @Property(tries = 150)
    void columnAreasOnALevelSumToItsFlooredAreaByOccupancy(@ForAll long seed) {
        Building b = Buildings.random(seed);
        Derived d = Derivation.derive(b);
        for (Level l : b.levels()) {
            Map<String, Double> columns = new HashMap<>();
            for (DerivedMember m : d.onLevel(l.name()))
                if (m.role() == MemberRole.COLUMN) m.areas().forEach((k, v) -> columns.merge(k, v, Double::sum));
            Map<String, Double> expected = areaByUse(b.grid(), l);
            assertThat(columns.keySet()).as("level %s", l.name()).isEqualTo(expected.keySet());
            expected.forEach((use, a) -> assertThat(columns.get(use)).as("%s on %s", use, l.name()).isCloseTo(a, within(tol(a))));
        }
    }

    @Property(tries = 150)
    void unreducedLoadsAtTheFootOfAllStacksEqualTheLoadsOnAllLevels(@ForAll long seed) {
        Building b = Buildings.random(seed);
        Derived d = Derivation.derive(b);
        double live = 0, roof = 0, dead = 0;
        for (Level l : b.levels()) {
            Map<String, Double> uses = areaByUse(b.grid(), l);
            live += floorLive(uses);
            roof += roofLive(uses);
            dead += deadLoad(b, l);
        }
        Map<String, DerivedMember> byId = byId(d);
        double footLive = 0, footRoof = 0, footDead = 0;
        for (TakeDown t : d.takeDowns()) {
            TakeDown.Row foot = t.rows().get(t.rows().size() - 1);
            footLive += foot.liveUnreduced();
            footDead += foot.dead();
            footRoof += byId.get(foot.member()).result().record().result("Lr0.P");
        }
        assertThat(footLive).as("Σ L0 A").isCloseTo(live, within(tol(live)));
        assertThat(footRoof).as("Σ Lr0 A").isCloseTo(roof, within(tol(roof)));
        assertThat(footDead).as("Σ D A").isCloseTo(dead, within(tol(dead)));
    }

    @Property(tries = 150)
    void atEveryLevelTheColumnsReceiveExactlyTheLoadAppliedThere(@ForAll long seed) {
        Building b = Buildings.random(seed);
        Derived d = Derivation.derive(b);
        Map<String, Double> deadAt = new HashMap<>(), liveAt = new HashMap<>();
        for (TakeDown t : d.takeDowns()) {
            double above = 0;
            for (TakeDown.Row r : t.rows()) {
                deadAt.merge(r.level(), r.deadAtLevel(), Double::sum);
                liveAt.merge(r.level(), r.liveUnreduced() - above, Double::sum);
                above = r.liveUnreduced();
            }
        }
        for (Level l : b.levels()) {
            double dead = deadLoad(b, l), live = floorLive(areaByUse(b.grid(), l));
            assertThat(deadAt.getOrDefault(l.name(), 0.0)).as("D at %s", l.name()).isCloseTo(dead, within(tol(dead)));
            assertThat(liveAt.getOrDefault(l.name(), 0.0)).as("L0 at %s", l.name()).isCloseTo(live, within(1e-6 * Math.max(1, live)));
        }
    }

    @Property(tries = 150)
    void everyBeamAndGirderIsInEquilibriumWithItsLoad(@ForAll long seed) {
        Derived d = Derivation.derive(Buildings.random(seed));
        for (DerivedMember m : d.members()) {
            if (m.role() == MemberRole.COLUMN) continue;
            CalcRecord r = m.result().record();
            for (String c : List.of("D", "L0", "L", "Lr")) {
                if (!Loads.hasStep(r, "W." + c)) continue;
                double w = r.step("W." + c).result();
                assertThat(r.result(c + ".RA") + r.result(c + ".RB")).as("%s: R_A + R_B for %s", m.name(), c).isCloseTo(w, within(tol(w)));
            }
            // the unreduced load it carries is L0 times the tributary area it lists, and it hands all of it on
            double l0 = floorLive(m.areas());
            double carried = Loads.hasStep(r, "W.L0") ? r.step("W.L0").result() : 0;
            assertThat(carried).as("%s: W.L0 = Σ L0 A", m.name()).isCloseTo(l0, within(tol(l0)));
            double handed = m.result().left().liveTotal() + m.result().right().liveTotal();
            assertThat(handed).as("%s: end shares", m.name()).isCloseTo(l0 + roofLive(m.areas()), within(tol(l0)));
            assertThat(m.result().left().area() + m.result().right().area()).as("%s: areas handed on", m.name())
                    .isCloseTo(m.tributaryArea(), within(tol(m.tributaryArea())));
        }
    }

    @Property(tries = 100)
    void aMirroredBuildingGivesMirroredResults(@ForAll long seed) {
        Building b = Buildings.random(seed);
        Derived d = Derivation.derive(b), m = Derivation.derive(Buildings.mirrorX(b));
        int nx = b.grid().x().cells();
        double extent = b.grid().x().extent();
        Map<String, TakeDown> mirrored = new HashMap<>();
        for (TakeDown t : m.takeDowns()) mirrored.put(t.gridPoint(), t);
        assertThat(m.takeDowns()).hasSameSizeAs(d.takeDowns());
        for (TakeDown t : d.takeDowns()) {
            int i = b.grid().x().names().indexOf(t.gridPoint().substring(t.gridPoint().indexOf('/') + 1));
            String y = t.gridPoint().substring(0, t.gridPoint().indexOf('/'));
            TakeDown u = mirrored.get(y + "/" + b.grid().x().name(nx - i));
            assertThat(u).as("mirror of %s", t.gridPoint()).isNotNull();
            assertThat(u.rows()).hasSameSizeAs(t.rows());
            for (int k = 0; k < t.rows().size(); k++) sameRow(t.rows().get(k), u.rows().get(k), t.gridPoint());
        }
        Map<String, DerivedMember> beams = new HashMap<>();
        for (DerivedMember x : m.members()) if (x.role() != MemberRole.COLUMN) beams.put(key(x, extent, true), x);
        assertThat(beams).hasSize((int) d.members().stream().filter(x -> x.role() != MemberRole.COLUMN).count());
        for (DerivedMember x : d.members()) {
            if (x.role() == MemberRole.COLUMN) continue;
            DerivedMember y = beams.get(key(x, extent, false));
            assertThat(y).as("mirror of %s on %s", x.name(), x.level()).isNotNull();
            assertThat(y.kind()).isEqualTo(x.kind());
            assertThat(y.role()).isEqualTo(x.role());
            close(y.directArea(), x.directArea(), x.name());
            close(y.tributaryArea(), x.tributaryArea(), x.name());
            for (String c : List.of("D", "L", "Lr", "LRFD", "ASD")) {
                CalcRecord p = x.result().record(), q = y.result().record();
                close(q.result(c + ".M+"), p.result(c + ".M+"), x.name() + " " + c + ".M+");
                close(q.result(c + ".V"), p.result(c + ".V"), x.name() + " " + c + ".V");
                double[] rp = sorted(p.result(c + ".RA"), p.result(c + ".RB")), rq = sorted(q.result(c + ".RA"), q.result(c + ".RB"));
                close(rq[0], rp[0], x.name() + " " + c + ".R");
                close(rq[1], rp[1], x.name() + " " + c + ".R");
            }
        }
    }

    private static void sameRow(TakeDown.Row a, TakeDown.Row b, String where) {
        assertThat(b.level()).isEqualTo(a.level());
        assertThat(b.floorsSupported()).as(where).isEqualTo(a.floorsSupported());
        assertThat(b.kll()).as(where).isEqualTo(a.kll());
        assertThat(b.lrfdCombination()).as(where).isEqualTo(a.lrfdCombination());
        double[][] pairs = {{a.areaAtLevel(), b.areaAtLevel()}, {a.cumulativeArea(), b.cumulativeArea()}, {a.factor(), b.factor()},
                {a.dead(), b.dead()}, {a.liveUnreduced(), b.liveUnreduced()}, {a.liveReduced(), b.liveReduced()},
                {a.roofLive(), b.roofLive()}, {a.lrfd(), b.lrfd()}, {a.asd(), b.asd()}};
        for (double[] p : pairs) close(p[1], p[0], where + " at " + a.level());
    }

    /** A beam's place on plan, mirrored when {@code mirror}, rounded so that sums in another order still match. */
    private static String key(DerivedMember m, double extent, boolean mirror) {
        double x = (m.plan().x1() + m.plan().x2()) / 2, y = (m.plan().y1() + m.plan().y2()) / 2;
        if (mirror) x = extent - x;
        return m.level() + "|" + m.role() + "|" + Math.round(x * 1e4) + "|" + Math.round(y * 1e4);
    }

    private static double[] sorted(double a, double b) { return new double[] {Math.min(a, b), Math.max(a, b)}; }

    private static void close(double actual, double expected, String what) {
        if (Double.isNaN(expected)) {
            assertThat(actual).as(what).isNaN();
            return;
        }
        assertThat(actual).as(what).isCloseTo(expected, within(1e-9 * Math.max(1, Math.abs(expected))));
    }

    static Map<String, DerivedMember> byId(Derived d) {
        Map<String, DerivedMember> out = new HashMap<>();
        for (DerivedMember m : d.members()) out.put(m.id(), m);
        return out;
    }

    static double deadLoad(Building b, Level l) {
        double s = 0;
        for (var bay : l.bays()) {
            if (bay.opening()) continue;
            Level one = new Level(l.name(), l.elevation(), l.roof(), l.roofSlope(), List.of(bay));
            s += bay.deadLoad() * flooredArea(b.grid(), one);
        }
        return s;
    }
}
