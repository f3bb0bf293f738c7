package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.statistics.Statistics;

import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static com.baysheet.framing.Loads.floorArea;
import static com.baysheet.framing.Loads.floorLive;
import static com.baysheet.framing.Loads.l0;
import static com.baysheet.framing.Loads.lowestFactor;
import static com.baysheet.framing.Loads.recordAreas;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Reduction limits and the column take-down over random models (see {@link Buildings#random}). */
class TakeDownProperties {
    private static final double TOL = 1e-9;

    /**
     * ASCE 7-16 4.7.2 to 4.7.5: no occupancy's reduced load falls below its limit (0.50 L0 on one floor, 0.40
     * on two or more; heavy loads and garages unreduced on one floor, 0.80 on two or more; assembly unreduced),
     * and nothing is increased.
     */
    @Property(tries = 150)
    void reducedLoadsNeverFallBelowTheirLimits(@ForAll long seed) {
        Derived d = Derivation.derive(Buildings.random(seed));
        Map<String, TakeDown.Row> rowOf = new HashMap<>();
        for (TakeDown t : d.takeDowns()) for (TakeDown.Row r : t.rows()) rowOf.put(r.member(), r);
        for (DerivedMember m : d.members()) {
            CalcRecord r = m.result().record();
            int floors = m.role() == MemberRole.COLUMN ? Math.max(1, rowOf.get(m.id()).floorsSupported()) : 1;
            Map<String, Double> areas = recordAreas(r);
            double lowest = 0, full = 0;
            for (var e : areas.entrySet()) {
                if (Loads.isRoof(e.getKey())) continue;
                double f = r.step("L[" + e.getKey() + "]").result() / l0(e.getKey());
                assertThat(f).as("%s: factor on %s", m.name(), e.getKey())
                        .isBetween(lowestFactor(e.getKey(), floors) - TOL, 1 + TOL);
                lowest += lowestFactor(e.getKey(), floors) * l0(e.getKey()) * e.getValue();
                full += l0(e.getKey()) * e.getValue();
            }
            if (full == 0) continue;
            double reduced = m.role() == MemberRole.COLUMN ? r.result("L.P") : r.result("L.RA") + r.result("L.RB");
            assertThat(reduced).as("%s: L against its limit", m.name()).isBetween(lowest * (1 - TOL), full * (1 + TOL));
        }
    }

    /** Roof live load by 4.8.2 stays within 12 to 20 psf on every member and is never counted as L. */
    @Property(tries = 150)
    void roofLiveLoadStaysWithinItsBoundsAndApartFromFloorLoad(@ForAll long seed) {
        Derived d = Derivation.derive(Buildings.random(seed));
        for (DerivedMember m : d.members()) {
            CalcRecord r = m.result().record();
            double roofArea = Loads.roofArea(recordAreas(r));
            if (roofArea == 0) {
                assertThat(m.role() == MemberRole.COLUMN ? r.result("Lr.P") : r.result("Lr.RA")).as(m.name()).isIn(0.0, Double.NaN);
                continue;
            }
            double lr = r.step("Lr").result();
            assertThat(lr).as("%s: Lr psf", m.name()).isBetween(12 - TOL, 20 + TOL);
            if (m.role() == MemberRole.COLUMN) {
                assertThat(r.result("Lr.P")).as(m.name()).isCloseTo(lr * roofArea, within(1e-6 * lr * roofArea));
                assertThat(r.result("L0.P")).as("%s: L0 holds floors only", m.name())
                        .isCloseTo(floorLive(recordAreas(r)), within(1e-6 * Math.max(1, r.result("L0.P"))));
            }
        }
    }

    /**
     * Rows run top down; the cumulative area never falls; floors supported counts the floors (never the roof)
     * at and above the level that bring area to this column; and the LRFD and ASD values are the largest of the
     * ASCE 7-16 2.3.1 and 2.4.1 combinations of the row's D, L and Lr.
     */
    @Property(tries = 150)
    void takeDownRowsRunTopDownAndCombineTheirOwnColumns(@ForAll long seed) {
        Building b = Buildings.random(seed);
        Derived d = Derivation.derive(b);
        Map<String, DerivedMember> byId = DerivationProperties.byId(d);
        Map<String, Double> elevation = new HashMap<>();
        for (Level l : b.levels()) elevation.put(l.name(), l.elevation());
        for (TakeDown t : d.takeDowns()) {
            List<TakeDown.Row> rows = t.rows();
            assertThat(rows).isSortedAccordingTo(Comparator.comparingDouble((TakeDown.Row r) -> elevation.get(r.level())).reversed());
            double area = 0;
            int floors = 0;
            TakeDown.Row above = null;
            for (TakeDown.Row r : rows) {
                DerivedMember col = byId.get(r.member());
                assertThat(col.role()).isEqualTo(MemberRole.COLUMN);
                assertThat(col.level()).isEqualTo(r.level());
                double here = floorArea(col.areas());
                if (here > 0) floors++;
                area += here;
                assertThat(r.floorsSupported()).as("%s at %s", t.gridPoint(), r.level()).isEqualTo(floors);
                assertThat(r.cumulativeArea()).as("ΣA_T").isCloseTo(area, within(1e-9 * Math.max(1, area)));
                assertThat(r.reducibleArea()).as("reducible A_T").isBetween(0.0, r.cumulativeArea() * (1 + 1e-12));
                if (above != null) {
                    assertThat(r.cumulativeArea()).isGreaterThanOrEqualTo(above.cumulativeArea());
                    assertThat(r.dead()).isCloseTo(above.dead() + r.deadAtLevel(), within(1e-9 * Math.max(1, r.dead())));
                    assertThat(r.liveUnreduced()).isGreaterThanOrEqualTo(above.liveUnreduced() - 1e-9);
                }
                combinations(t.gridPoint(), r, col.result().record());
                above = r;
            }
        }
    }

    /**
     * The influence area of a column supporting several floors is Σ K_LL,i × (reducible A_T,i) over those floors, each
     * floor with the K_LL of the column's place on it (common practice; Commentary C4.7, from memory), and f follows
     * from it by ASCE 7-16 4.7.2: 1 below 400 ft², else 0.25 + 15/√(K_LL·A_T), never below 0.50 (one floor) or 0.40
     * (two or more). So f is never below the factor with every floor at the largest K_LL present (a column is never
     * reduced more than that) nor above the factor with every floor at the smallest. (Reduced P_L at or above the
     * value with every floor at the smallest K_LL is NOT an invariant: the sum lies between the two.)
     */
    @Property(tries = 150)
    void influenceAreaIsTheSumOverTheFloorsOfEachFloorsKllTimesItsReducibleArea(@ForAll long seed) {
        Derived d = Derivation.derive(Buildings.random(seed));
        Map<String, DerivedMember> byId = DerivationProperties.byId(d);
        int varied = 0;
        for (TakeDown t : d.takeDowns()) {
            List<double[]> kll = new java.util.ArrayList<>();       // per floor supported: {K_LL}
            List<Map<String, Double>> areas = new java.util.ArrayList<>();
            for (TakeDown.Row r : t.rows()) {
                DerivedMember col = byId.get(r.member());
                double k = Buildings.US.edition().kll(col.kind());
                assertThat(r.kll()).as("%s at %s: K_LL of its place", t.gridPoint(), r.level()).isEqualTo(k);
                if (floorArea(col.areas()) > 0) { kll.add(new double[] {k}); areas.add(col.areas()); }
                int n = areas.size();
                double sum = 0, reducible = 0, kMin = Double.MAX_VALUE, kMax = 0;
                for (int i = 0; i < n; i++) {
                    double a = 0;
                    for (var e : areas.get(i).entrySet()) if (Loads.reducible(e.getKey(), n)) a += e.getValue();
                    if (a == 0) continue;
                    sum += kll.get(i)[0] * a;
                    reducible += a;
                    kMin = Math.min(kMin, kll.get(i)[0]);
                    kMax = Math.max(kMax, kll.get(i)[0]);
                }
                if (kMin < kMax) varied++;
                String where = t.gridPoint() + " at " + r.level();
                assertThat(r.reducibleArea()).as("%s: reducible A_T", where).isCloseTo(reducible, within(1e-9 * Math.max(1, reducible)));
                assertThat(r.influenceArea()).as("%s: Σ K_LL,i A_T,r,i", where).isCloseTo(sum, within(1e-9 * Math.max(1, sum)));
                if (n == 0) continue;
                double f = r.factor();
                assertThat(f).as("%s: f from the influence area printed", where).isCloseTo(Loads.basicFactor(sum, n), within(1e-12));
                assertThat(f).as("%s: limit", where).isBetween(n == 1 ? 0.5 : 0.4, 1.0);
                if (reducible > 0) {
                    assertThat(f).as("%s: not reduced more than with every floor at K_LL %s", where, kMax)
                            .isGreaterThanOrEqualTo(Loads.basicFactor(kMax * reducible, n) - 1e-12);
                    assertThat(f).as("%s: not reduced less than with every floor at K_LL %s", where, kMin)
                            .isLessThanOrEqualTo(Loads.basicFactor(kMin * reducible, n) + 1e-12);
                }
            }
        }
        // the random models must exercise stacks whose K_LL varies over their floors
        Statistics.label("K_LL varies over a stack").collect(varied > 0);
        Statistics.label("K_LL varies over a stack").coverage(c -> c.check(true).percentage(p -> p > 10));
    }

    private static void combinations(String where, TakeDown.Row r, CalcRecord col) {
        // the design live load is the reduced uniform load, or the concentrated load of 4.4 where that is larger
        double ldes = r.liveUnreduced() > 0 ? Math.max(r.liveReduced(), col.result("Lc.P")) : r.liveReduced();
        assertThat(col.result("Ldes.P")).as(where).isCloseTo(ldes, within(1e-9 * Math.max(1, ldes)));
        Map<String, Double> lrfd = Loads.lrfd(r.dead(), ldes, r.roofLive(), Loads.halfLAllowed(recordAreas(col)));
        Map<String, Double> asd = Loads.asd(r.dead(), ldes, r.roofLive());
        double tol = 1e-9 * Math.max(1, Loads.max(lrfd));
        assertThat(r.lrfd()).as("%s at %s: P_u", where, r.level()).isCloseTo(Loads.max(lrfd), within(tol));
        assertThat(lrfd.get(r.lrfdCombination())).as("%s at %s: %s", where, r.level(), r.lrfdCombination()).isCloseTo(r.lrfd(), within(tol));
        assertThat(r.asd()).as("%s at %s: P_a", where, r.level()).isCloseTo(Loads.max(asd), within(tol));
        assertThat(asd.get(r.asdCombination())).as("%s at %s: %s", where, r.level(), r.asdCombination()).isCloseTo(r.asd(), within(tol));
    }
}
