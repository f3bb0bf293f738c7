package com.baysheet.engine.member;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.Editions;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.CalcContext;
import org.junit.jupiter.api.Test;

import static com.baysheet.engine.Fixtures.calc;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** A balcony row on a member: its L0, no partition allowance, not reduced, and the note citing the load table. */
class BalconyNoteTest {
    private static final DesignOptions PARTITIONS = new DesignOptions(true, false);

    @Test
    void siBalconyBeamCarriesOneAndAHalfTimesTheSiL0WithoutPartitions() {
        // SI: 1.5 × 2.40 = 3.60 kN/m² on a 2 m strip over 9 m; K_LL = 1 (edge beam with cantilever slab);
        // not reduced (our conservative choice), no 0.72 kN/m² partition allowance (ASCE 7-16 4.3.2 is not for balconies)
        // w_L = 3.60 × 2 = 7.20 kN/m; R_L = 7.20 × 9 / 2 = 32.4 kN
        CalcContext si = Fixtures.SI.withOptions(PARTITIONS);
        CalcRecord r = calc(si, Fixtures.beam(MemberKind.EDGE_BEAM_CANTILEVER, 9, "balcony:office", 2, 3));
        assertThat(r.result("L.RA")).isCloseTo(32.4, within(1e-9));
        assertThat(r.result("L0.RA")).isCloseTo(32.4, within(1e-9));
        assertThat(Fixtures.hasStep(r, "L_p[balcony:office]")).isFalse();
        Note n = r.notes().stream().filter(x -> x.text().startsWith("Balcony or deck")).findFirst().orElseThrow();
        assertThat(n.level()).isEqualTo(Note.Level.INFO);
        assertThat(n.text()).contains("1.5 × 2.40 kPa").contains("4.79 kPa").contains("3.60 kPa");
        assertThat(n.clause().label()).isEqualTo("ASCE 7-16 Table 4.3-1");
    }

    @Test
    void aBalconyIsNotReducedEvenWhereItsInfluenceAreaIsLarge() {
        // interior column with 1000 ft² of balcony: K_LL A_T = 4000 ft² would give f = 0.487 for an office;
        // the balcony row is not reduced: L = 75 × 1000 = 75 000 lb
        CalcRecord r = calc(Fixtures.US, Fixtures.column(MemberKind.INTERIOR_COLUMN, 1, Double.NaN,
                new AreaLoad("balcony:office", 1000, 60)));
        assertThat(r.result("L.P")).isCloseTo(75_000.0, within(1e-6));
        assertThat(r.notes()).anyMatch(x -> x.text().contains("not reduced by choice"));
    }

    @Test
    void theClauseLabelFollowsTheEdition() {
        // ASCE 7-10 numbers the table 4-1
        CalcContext old = Fixtures.US.withEdition(Editions.builtIn().get("ASCE 7-10"));
        CalcRecord r = calc(old, Fixtures.beam(MemberKind.EDGE_BEAM_CANTILEVER, 20, "balcony:residential-other", 5, 40));
        assertThat(r.notes()).anyMatch(x -> x.text().startsWith("Balcony or deck") && x.clause().label().equals("ASCE 7-10 Table 4-1"));
        assertThat(r.result("L0.RA")).isCloseTo(60 * 5 * 10, within(1e-9)); // 1.5 × 40 = 60 psf
    }
}
