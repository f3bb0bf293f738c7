package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

class ReductionProperties {
    static final String[] OCCUPANCIES = {"office", "office-corridor", "storage-heavy", "garage-passenger", "assembly-other", "retail-upper"};

    static double factor(CalcContext ctx, MemberKind kind, String id, double area, int floors) {
        RecordBuilder rec = new RecordBuilder("P", ctx.edition().id(), ctx.system());
        // one-way slabs cap their area by their span: 40 ft, given in the context's own unit
        double span = ctx.system() == UnitSystem.US ? 40 : Convert.toSi(Quantity.LENGTH, 40);
        return ReductionMethods.forEdition(ctx).reduce(ctx, kind, Map.of(id, area), floors, span, rec).of(id);
    }

    @Property(tries = 500)
    void limitsAreNeverCrossed(@ForAll MemberKind kind, @ForAll @IntRange(min = 0, max = 5) int occ,
                               @ForAll @DoubleRange(min = 1, max = 1e6) double area, @ForAll @IntRange(min = 1, max = 30) int floors) {
        double f = factor(Fixtures.US, kind, OCCUPANCIES[occ], area, floors);
        double limit = floors == 1 ? 0.5 : 0.4; // ASCE 7-16 4.7.2
        assertThat(f).isBetween(limit, 1.0);
        if (!OCCUPANCIES[occ].startsWith("office") && !OCCUPANCIES[occ].startsWith("retail")) assertThat(f).isGreaterThanOrEqualTo(0.8);
    }

    @Property(tries = 500)
    void factorNeverRisesWithArea(@ForAll MemberKind kind, @ForAll @IntRange(min = 0, max = 5) int occ,
                                  @ForAll @DoubleRange(min = 1, max = 1e5) double area, @ForAll @DoubleRange(min = 0, max = 1e4) double more,
                                  @ForAll @IntRange(min = 1, max = 4) int floors, @ForAll UnitSystem units) {
        CalcContext ctx = units == UnitSystem.US ? Fixtures.US : Fixtures.SI;
        assertThat(factor(ctx, kind, OCCUPANCIES[occ], area + more, floors))
                .isLessThanOrEqualTo(factor(ctx, kind, OCCUPANCIES[occ], area, floors));
    }

    @Property(tries = 500)
    void usAndSiFactorsAgreeWithinOneTenthOfAPercent(@ForAll MemberKind kind, @ForAll @DoubleRange(min = 1, max = 1e5) double sqft,
                                                     @ForAll @IntRange(min = 1, max = 4) int floors) {
        // exactly converted area; the SI equation's constants are the code's rounded ones (4.57 for 4.572)
        double us = factor(Fixtures.US, kind, "office", sqft, floors);
        double si = factor(Fixtures.SI, kind, "office", Convert.toSi(Quantity.AREA, sqft), floors);
        assertThat(Math.abs(si - us) / us).isLessThanOrEqualTo(1e-3);
    }

    @Property(tries = 300)
    void roofLiveLoadStaysWithinItsBoundsAndNeverRises(@ForAll @DoubleRange(min = 1, max = 5000) double area,
                                                       @ForAll @DoubleRange(min = 0, max = 2000) double more,
                                                       @ForAll @DoubleRange(min = 0, max = 24) double slope,
                                                       @ForAll @DoubleRange(min = 0, max = 10) double steeper) {
        var roof = OccupancyCatalogue.builtIn().get("roof-ordinary");
        RecordBuilder rec = new RecordBuilder("P", "ASCE 7-16", UnitSystem.US);
        double lr = 20 * RoofLiveLoad.factor(Fixtures.US, roof, area, slope, rec);
        assertThat(lr).isBetween(12.0, 20.0); // ASCE 7-16 4.8.2
        assertThat(20 * RoofLiveLoad.factor(Fixtures.US, roof, area + more, Math.min(24, slope + steeper), rec)).isLessThanOrEqualTo(lr);
    }
}
