package com.baysheet.engine.member;

import com.baysheet.engine.load.Support;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** ASCE 7-16 4.4: the concentrated load on its 2.5 ft square, placed for the largest effect. */
class ConcentratedCheckTest {
    static final double P = 2000, C = 2.5;

    @Test
    void simpleSpanMomentPeaksWithTheLoadCentred() {
        // statics of a patch load P over c centred on a simple span: M = Pℓ/4 − Pc/8
        var p = ConcentratedCheck.place(new Support.Simple(20), P, C, ConcentratedCheck.Effect.MAX_MOMENT);
        assertThat(p.effect()).isCloseTo(P * 20 / 4 - P * C / 8, within(1e-9));
        assertThat(p.at()).isCloseTo(10, within(1e-9));
    }

    @Test
    void simpleSpanShearAndReactionPeakWithTheLoadAgainstASupport() {
        // R_A = P(1 − c/2ℓ) with the patch's edge at the support
        double r = P * (1 - C / 40);
        assertThat(ConcentratedCheck.place(new Support.Simple(20), P, C, ConcentratedCheck.Effect.SHEAR).effect()).isCloseTo(r, within(1e-9));
        assertThat(ConcentratedCheck.place(new Support.Simple(20), P, C, ConcentratedCheck.Effect.LEFT_REACTION).effect()).isCloseTo(r, within(1e-9));
        assertThat(ConcentratedCheck.place(new Support.Simple(20), P, C, ConcentratedCheck.Effect.RIGHT_REACTION).effect()).isCloseTo(r, within(1e-9));
    }

    @Test
    void overhangReactionsAreTakenEachAtItsOwnWorstPosition() {
        // beam overhanging one support, ℓ = 20, a = 5: R_A peaks with the load at the left support, P(1 − c/2ℓ);
        // R_B with the load at the tip, P(ℓ + a − c/2)/ℓ. Each reaction is its own, not the larger of the two.
        Support s = new Support.Overhang(20, 5);
        var r1 = ConcentratedCheck.place(s, P, C, ConcentratedCheck.Effect.LEFT_REACTION);
        var r2 = ConcentratedCheck.place(s, P, C, ConcentratedCheck.Effect.RIGHT_REACTION);
        assertThat(r1.effect()).isCloseTo(P * (1 - C / 40), within(1e-9));
        assertThat(r2.effect()).isCloseTo(P * (25 - C / 2) / 20, within(1e-9));
        assertThat(r2.at()).isCloseTo(25 - C / 2, within(1e-9));
    }

    @Test
    void overhangHoggingMomentPeaksWithTheLoadAtTheTip() {
        // statics: the moment at the support of the load's part on the overhang, −P(a − c/2) with the patch at the tip
        var m = ConcentratedCheck.place(new Support.Overhang(20, 5), P, C, ConcentratedCheck.Effect.MIN_MOMENT);
        assertThat(m.effect()).isCloseTo(-P * (5 - C / 2), within(1e-9));
        assertThat(m.at()).isCloseTo(25 - C / 2, within(1e-12));
    }

    @Test
    void overhangSaggingMomentIsTheBackSpansWithTheLoadCentredOnIt() {
        // load on the overhang only lifts the back span, so the simple span's Pℓ/4 − Pc/8 with the patch at ℓ/2
        var m = ConcentratedCheck.place(new Support.Overhang(20, 5), P, C, ConcentratedCheck.Effect.MAX_MOMENT);
        assertThat(m.effect()).isCloseTo(P * 20 / 4 - P * C / 8, within(1e-9));
        assertThat(m.at()).isCloseTo(10, within(1e-12));
    }

    @Test
    void overhangShearIsTheWholeLoadWithThePatchOnTheOverhang() {
        // beside the support the shear is P with the patch wholly on the overhang; the back span's, P(x − ℓ)/ℓ, is
        // less here (a − c/2 < ℓ) and largest at the tip, where the load is placed
        var v = ConcentratedCheck.place(new Support.Overhang(20, 5), P, C, ConcentratedCheck.Effect.SHEAR);
        assertThat(v.effect()).isCloseTo(P, within(1e-9));
        assertThat(v.at()).isCloseTo(25 - C / 2, within(1e-12));
        // an overhang longer than the back span: the back span's shear at the tip exceeds P
        var longer = ConcentratedCheck.place(new Support.Overhang(8, 12), P, C, ConcentratedCheck.Effect.SHEAR);
        assertThat(Math.abs(longer.effect())).isCloseTo(P * (12 - C / 2) / 8, within(1e-9)); // the left support lifts
    }

    @Test
    void cantileverFixedEndMomentPeaksWithTheLoadAtTheFreeEnd() {
        var m = ConcentratedCheck.place(new Support.Cantilever(6), P, C, ConcentratedCheck.Effect.MIN_MOMENT);
        assertThat(m.effect()).isCloseTo(-P * (6 - C / 2), within(1e-9));
        assertThat(ConcentratedCheck.place(new Support.Cantilever(6), P, C, ConcentratedCheck.Effect.SHEAR).effect())
                .isCloseTo(P, within(1e-9));
    }

    @Test
    void memberShorterThanTheContactAreaTakesTheWholeLoadSpread() {
        var m = ConcentratedCheck.place(new Support.Simple(2), P, C, ConcentratedCheck.Effect.MAX_MOMENT);
        assertThat(m.effect()).isCloseTo(P * 2 / 8, within(1e-9)); // spread over the whole span: wℓ²/8
    }

    /** The placement found is the largest over a dense brute-force scan of positions, and no less. */
    @Property(tries = 200)
    void placementIsTheWorstOverADenseScan(@ForAll @IntRange(min = 0, max = 2) int kind,
                                           @ForAll @DoubleRange(min = 1, max = 40) double span,
                                           @ForAll @DoubleRange(min = 0.1, max = 1.5) double overhangShare,
                                           @ForAll @DoubleRange(min = 0.1, max = 3) double side,
                                           @ForAll @IntRange(min = 0, max = 4) int effect) {
        Support s = switch (kind) {
            case 0 -> new Support.Simple(span);
            case 1 -> new Support.Overhang(span, span * overhangShare);
            default -> new Support.Cantilever(span);
        };
        ConcentratedCheck.Effect e = ConcentratedCheck.Effect.values()[effect];
        var found = ConcentratedCheck.place(s, P, side, e);
        double patch = Math.min(side, s.length()), lo = patch / 2, hi = s.length() - patch / 2;
        double best = Double.NEGATIVE_INFINITY, bestValue = 0;
        int n = 2000;
        for (int i = 0; i <= n; i++) {
            double x = hi > lo ? lo + (hi - lo) * i / n : lo;
            double v = ConcentratedCheck.value(s, P, patch, x, e);
            double score = e == ConcentratedCheck.Effect.MIN_MOMENT ? -v : e.name().endsWith("REACTION") ? v : Math.abs(v);
            if (score > best) { best = score; bestValue = v; }
        }
        double tol = 1e-6 * P * s.length();
        double foundScore = e == ConcentratedCheck.Effect.MIN_MOMENT ? -found.effect()
                : e.name().endsWith("REACTION") ? found.effect() : Math.abs(found.effect());
        assertThat(foundScore).as(s + " " + e + " brute force " + bestValue).isGreaterThanOrEqualTo(best - tol);
        assertThat(found.effect()).isCloseTo(ConcentratedCheck.value(s, P, patch, found.at(), e), within(1e-9 * P * s.length()));
    }
}
