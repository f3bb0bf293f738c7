package com.baysheet.engine.member;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Step;
import com.baysheet.engine.units.Quantity;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

import java.util.List;

import static com.baysheet.engine.Fixtures.US;
import static com.baysheet.engine.Fixtures.calc;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The substituted values of the statics steps are numbers a plan checker can work through to the result. */
class StaticsTextTest {
    static final String[] FLOORS = {"office", "residential-other", "retail-upper", "storage-heavy", "assembly-other"};

    @Test
    void simpleUniformBeamShowsTheClosedFormsWithTheirNumbers() {
        // 30 ft span, 10 ft wide office: (43.1 reduced + 15 partition) psf × 10 ft = 581 plf = 0.581 klf;
        // R = wℓ/2 = 0.581 × 30.0 / 2 = 8.72 kip, M = wℓ²/8 = 0.581 × 30.0² / 8 = 65.4 kip·ft (AISC Table 3-23, case 1)
        CalcRecord r = calc(US.withOptions(new DesignOptions(true, false)), Fixtures.beam(MemberKind.INTERIOR_BEAM, 30, "office", 10, 15));
        assertThat(r.step("W.L").substituted()).isEqualTo("0.581 × 30.0");
        assertThat(r.step("R_A.L").formula()).isEqualTo("R_A = wℓ/2");
        assertThat(r.step("R_A.L").substituted()).isEqualTo("0.581 × 30.0 / 2");
        assertThat(r.step("R_B.L").substituted()).isEqualTo("0.581 × 30.0 / 2");
        assertThat(r.step("V.L").substituted()).isEqualTo("0.581 × 30.0 / 2");
        assertThat(r.step("M+.L").formula()).isEqualTo("M+ = wℓ²/8");
        assertThat(r.step("M+.L").substituted()).isEqualTo("0.581 × 30.0² / 8");
        assertThat(r.step("R_A.L").shown()).isEqualTo("8.72 kip");
        assertThat(r.step("M+.L").shown()).isEqualTo("65.4 kip·ft");
    }

    @Property(tries = 150)
    void simpleUniformSubstitutionsEvaluateToThePrintedResult(
            @ForAll @DoubleRange(min = 4, max = 45) double span, @ForAll @DoubleRange(min = 0.5, max = 20) double width,
            @ForAll @IntRange(min = 0, max = 4) int occ, @ForAll @DoubleRange(min = 0, max = 120) double dead, @ForAll boolean si) {
        var ctx = si ? Fixtures.SI : Fixtures.US;
        CalcRecord r = calc(ctx, Fixtures.beam(MemberKind.INTERIOR_BEAM, span, FLOORS[occ], width, si ? dead / 20 : dead));
        for (String c : List.of("D", "L0", "L")) {
            if (r.steps().stream().noneMatch(s -> s.symbol().equals("W." + c))) continue;
            for (String e : List.of("W", "R_A", "R_B", "V", "M+")) {
                Step s = r.step(e + "." + c);
                if (s.result() == 0) continue;
                // three-figure inputs: each carries at most 0.5 % of rounding, a product of three about 1.5 %
                assertThat(Expression.eval(s.substituted())).as("%s: %s = %s", s.symbol(), s.substituted(), s.shown())
                        .isCloseTo(shown(ctx, s, e), within(0.015 * Math.abs(shown(ctx, s, e))));
            }
        }
    }

    @Property(tries = 150)
    void reactionsOfAnyLoadingAreTheSumOfMomentsAboutTheOtherSupport(
            @ForAll @DoubleRange(min = 6, max = 40) double span, @ForAll @DoubleRange(min = 0, max = 0.8) double share,
            @ForAll @DoubleRange(min = 0.05, max = 0.95) double at, @ForAll @DoubleRange(min = 200, max = 20000) double p,
            @ForAll @DoubleRange(min = 1, max = 15) double width) {
        Support s = share == 0 ? new Support.Simple(span) : new Support.Overhang(span, span * share);
        CalcRecord r = calc(US, Fixtures.beam(s, List.of(new AreaStrip("office", width, 0, s.length() * 0.6, 20)),
                List.of(new PointLoad(s.length() * at, p, List.of(), List.of())), Double.NaN, Double.NaN));
        for (String e : List.of("R_A.D", "R_B.D", "R_A.L", "R_B.L", "W.D")) {
            Step st = r.step(e);
            assertThat(st.formula()).as(e).contains(e.startsWith("W") ? "Σ" : e.startsWith("R_A") ? "ΣM_B = 0" : "ΣM_A = 0");
            // tolerance from the rounding of every number written: 1.5 % of the sum of the absolute terms
            String clamped = " < 0, taken as 0 (see the least reactions)", text = st.substituted().replace(clamped, "");
            double v = Expression.eval(text), tol = 0.015 * Expression.evalAbsolute(text) + 1e-9;
            if (st.substituted().endsWith(clamped)) {
                // a reaction the loads pull upward is reported as 0 here (uplift is in the least reactions) and says so
                assertThat(st.result()).as(e).isZero();
                assertThat(v).as("%s: %s", e, st.substituted()).isLessThan(tol);
            } else {
                assertThat(v).as("%s: %s = %s", e, st.substituted(), st.shown()).isCloseTo(st.result() / 1000, within(tol));
            }
        }
    }

    @Test
    void aCantileverShowsItsReactionAndFixedEndMomentAsSums() {
        // 6 ft cantilever, 10 ft of office dead 15 psf (0.150 klf) and 1.00 kip at the tip:
        // R = 0.150 × 6.00 + 1.00 = 1.90 kip, M− = −(0.150 × 6.00 × 3.00 + 1.00 × 6.00) = −8.70 kip·ft
        CalcRecord r = calc(US, Fixtures.beam(new Support.Cantilever(6), List.of(new AreaStrip("office", 10, 0, 6, 15)),
                List.of(new PointLoad(6, 1000, List.of(), List.of())), Double.NaN, Double.NaN));
        assertThat(r.step("R_A.D").substituted()).isEqualTo("0.150 × 6.00 + 1.00");
        assertThat(r.step("M-.D").substituted()).isEqualTo("−(0.150 × 6.00 × 3.00 + 1.00 × 6.00)");
        assertThat(Expression.eval(r.step("M-.D").substituted())).isCloseTo(-8.7, within(1e-9));
        assertThat(r.step("M-.D").result()).isCloseTo(-8700, within(1e-9));
    }

    private static double shown(com.baysheet.engine.CalcContext ctx, Step s, String e) {
        Quantity q = e.equals("M+") ? Quantity.MOMENT : Quantity.FORCE;
        return q.unit(ctx.system()).fromBase(s.result());
    }
}
