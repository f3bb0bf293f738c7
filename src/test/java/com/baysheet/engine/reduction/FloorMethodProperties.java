package com.baysheet.engine.reduction;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

import static org.assertj.core.api.Assertions.assertThat;

/** Every chosen method keeps its own limits: never above 1, never below its floor, never rising with area. */
class FloorMethodProperties {
    static final String[] OCCUPANCIES = {"office", "residential-other", "retail-upper", "school-classroom", "storage-light",
            "garage-passenger", "assembly-other", "office-corridor"};
    static final String[] SI_METHODS = {"ibc-2021-alternative", "ibc-2015-alternative", "en1991-recommended", "en1991-uk-na", "nbc-2020"};

    static double factor(String method, UnitSystem units, MemberKind kind, String id, double area, int floors, double dead) {
        // one-way slabs cap their area by their span: 40 ft in the system's own unit
        double span = units == UnitSystem.US ? 40 : Convert.toSi(Quantity.LENGTH, 40);
        return new MethodCase(method, units).reduce(kind, floors, span, dead, id, area).of(id);
    }

    @Property(tries = 400)
    void ibcAlternativeKeepsItsLimits(@ForAll MemberKind kind, @ForAll @IntRange(min = 0, max = 7) int occ,
                                      @ForAll @DoubleRange(min = 1, max = 1e5) double area, @ForAll @IntRange(min = 1, max = 20) int floors,
                                      @ForAll @DoubleRange(min = 0, max = 300) double dead) {
        String id = OCCUPANCIES[occ];
        double f = factor("ibc-2021-alternative", UnitSystem.US, kind, id, area, floors, dead);
        assertThat(f).isLessThanOrEqualTo(1.0);
        // IBC 2021 1607.12.2 item 4: at most 40 % (horizontal) or 60 % (vertical), nor 23.1 (1 + D/L0) %
        assertThat(f).isGreaterThanOrEqualTo(kind.isColumn() ? 0.4 - 1e-12 : 0.6 - 1e-12);
        double l0 = new MethodCase("ibc-2021-alternative", UnitSystem.US).ctx.catalogue().get(id).uniform(UnitSystem.US);
        assertThat(f).isGreaterThanOrEqualTo(1 - 0.231 * (1 + dead / l0) - 1e-12);
        // items 1 to 3: assembly never; L0 over 100 psf and garages at most 20 %, and only over two or more floors
        if (id.equals("assembly-other")) assertThat(f).isEqualTo(1.0);
        if (id.equals("storage-light") || id.equals("garage-passenger")) {
            assertThat(f).isGreaterThanOrEqualTo(0.8 - 1e-12);
            if (floors == 1) assertThat(f).isEqualTo(1.0);
        }
        // A of 150 ft² or less: none
        if (area <= 150) assertThat(f).isEqualTo(1.0);
    }

    @Property(tries = 400)
    void enFactorsStayBetweenTheirFloorAndOne(@ForAll MemberKind kind, @ForAll @IntRange(min = 0, max = 7) int occ,
                                              @ForAll @DoubleRange(min = 0.5, max = 1e4) double area, @ForAll @IntRange(min = 1, max = 30) int floors,
                                              @ForAll boolean annex) {
        String id = OCCUPANCIES[occ];
        double f = factor(annex ? "en1991-uk-na" : "en1991-recommended", UnitSystem.SI, kind, id, area, floors, 0);
        assertThat(f).isLessThanOrEqualTo(1.0);
        // EN 1991-1-1 Eq. 6.1: α_A ≥ 5/7 ψ0 = 0.5 (≥ 0.6 for C and D); Eq. 6.2: α_n > ψ0 = 0.7; UK NA: α_A ≥ 0.75, α_n ≥ 0.5
        double floor = annex ? (kind.isColumn() ? 0.5 : 0.75)
                : id.equals("retail-upper") || id.equals("school-classroom") ? 0.6 : 0.5;
        assertThat(f).isGreaterThanOrEqualTo(floor - 1e-12);
        // categories E and F, and the catalogue's non-reducible rows: not reduced
        if (id.equals("storage-light") || id.equals("garage-passenger") || id.equals("assembly-other")) assertThat(f).isEqualTo(1.0);
    }

    @Property(tries = 300)
    void nbcFactorsStayAboveTheirAsymptote(@ForAll MemberKind kind, @ForAll @IntRange(min = 0, max = 7) int occ,
                                           @ForAll @DoubleRange(min = 0.5, max = 1e5) double area, @ForAll @IntRange(min = 1, max = 30) int floors) {
        String id = OCCUPANCIES[occ];
        double f = factor("nbc-2020", UnitSystem.SI, kind, id, area, floors, 0);
        assertThat(f).isLessThanOrEqualTo(1.0);
        // NBC 2020 4.1.5.8: 0.5 + √(20/A) above 0.5 for storage, retail, garages; 0.3 + √(9.8/B) above 0.3 otherwise
        boolean large = id.equals("retail-upper") || id.equals("storage-light") || id.equals("garage-passenger");
        assertThat(f).isGreaterThan(large ? 0.5 : 0.3);
        if (area <= (large ? 80 : 20)) assertThat(f).isEqualTo(1.0);
    }

    @Property(tries = 500)
    void noMethodRisesWithArea(@ForAll @IntRange(min = 0, max = 4) int method, @ForAll MemberKind kind,
                               @ForAll @IntRange(min = 0, max = 7) int occ, @ForAll @DoubleRange(min = 0.5, max = 1e4) double area,
                               @ForAll @DoubleRange(min = 0, max = 1e3) double more, @ForAll @IntRange(min = 1, max = 12) int floors,
                               @ForAll @DoubleRange(min = 0, max = 10) double dead) {
        String m = SI_METHODS[method], id = OCCUPANCIES[occ];
        assertThat(factor(m, UnitSystem.SI, kind, id, area + more, floors, dead))
                .isLessThanOrEqualTo(factor(m, UnitSystem.SI, kind, id, area, floors, dead) + 1e-12);
    }

    @Property(tries = 300)
    void ibcUsAndSiAgreeWithinOneTenthOfAPercent(@ForAll MemberKind kind, @ForAll @DoubleRange(min = 1, max = 1e5) double sqft,
                                                 @ForAll @IntRange(min = 1, max = 6) int floors, @ForAll @DoubleRange(min = 0, max = 200) double psf) {
        // the SI constants are the code's rounded ones (0.861, 13.94 m², 4.79 kN/m²): agreement to about 1e-3
        double us = factor("ibc-2021-alternative", UnitSystem.US, kind, "office", sqft, floors, psf);
        double si = factor("ibc-2021-alternative", UnitSystem.SI, kind, "office", Convert.toSi(Quantity.AREA, sqft), floors,
                Convert.toSi(Quantity.PRESSURE, psf));
        assertThat(Math.abs(si - us)).isLessThanOrEqualTo(2e-3);
    }
}
