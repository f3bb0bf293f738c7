package com.baysheet.engine.member;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.reduction.RoofLiveLoad;
import com.baysheet.engine.units.UnitSystem;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Invariants of roof members: which rows 4.8.2 touches, and the 4.4 roof check as a maximum, never a sum. */
class RoofProperties {
    @Property(tries = 300)
    void roofRowOtherThanTheOrdinaryIsNeverReducedNorCapped(@ForAll @DoubleRange(min = 1, max = 200) double l0,
                                                            @ForAll @DoubleRange(min = 1, max = 5000) double area,
                                                            @ForAll @DoubleRange(min = 0, max = 24) double slope) {
        Assume.that(Math.abs(l0 - 20) > 20 * com.baysheet.engine.Tolerances.ORDINARY_ROOF);
        Occupancy row = OccupancyCatalogue.custom("roof-x", "Firm roof", UnitSystem.US, l0, 0, 30, ReductionRule.ROOF, false);
        RecordBuilder rec = new RecordBuilder("P", "ASCE 7-16", UnitSystem.US);
        // ASCE 7-16 4.8.2 covers ordinary roofs (L0 = 20 psf) only: Lr = L0
        assertThat(RoofLiveLoad.factor(Fixtures.US, row, area, slope, rec)).isEqualTo(1);
    }

    @Property(tries = 60)
    void roofDesignLoadIsTheLargerOfUniformAndConcentratedNeverTheirSum(@ForAll @DoubleRange(min = 2, max = 40) double span,
                                                                        @ForAll @DoubleRange(min = 0.5, max = 20) double width,
                                                                        @ForAll @DoubleRange(min = 0, max = 12) double slope) {
        CalcRecord r = Fixtures.calc(Fixtures.US, Fixtures.beam(new Support.Simple(span),
                List.of(new AreaStrip("roof-ordinary", width, 0, span, 15)), List.of(), slope, Double.NaN));
        for (String e : List.of("RA", "RB", "V", "M+")) {
            double lr = r.result("Lr." + e), lrc = r.result("Lrc." + e), des = r.result("Lrdes." + e);
            // ASCE 7-16 4.4: whichever gives the greater effect
            assertThat(des).as(e).isCloseTo(Math.max(lr, lrc), within(1e-9 * Math.max(1, des)));
            // ASCE 7-16 2.3.1 on a roof-only member: max(1.4D, 1.2D + 1.6Lr, 1.2D + 0.5Lr)
            double d = r.result("D." + e);
            assertThat(r.result("LRFD." + e)).as(e).isCloseTo(Math.max(1.4 * d, 1.2 * d + 1.6 * des), within(1e-6 * Math.max(1, des)));
        }
    }
}
