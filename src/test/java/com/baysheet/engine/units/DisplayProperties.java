package com.baysheet.engine.units;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The shown numbers are written by {@link Display} without the string building of the first writing, which
 * {@link Sig3Reference} keeps verbatim; every record's text (pages, sheets, the API) depends on the two agreeing
 * character for character, over every double: any bit pattern (tiny, huge, NaN, infinities, −0.0), decimals of
 * three and four figures exactly on and beside their rounding halves, values across the decades, and the products of
 * unit conversions as the engine forms them.
 */
class DisplayProperties {
    @Property(tries = 20_000)
    void anyBitPatternIsShownAsBefore(@ForAll("bitPatterns") double v) { same(v); }

    @Property(tries = 20_000)
    void roundingHalvesAndTheirNeighboursAreShownAsBefore(@ForAll("halves") double v) { same(v); }

    @Property(tries = 10_000)
    void valuesAcrossTheDecadesAreShownAsBefore(@ForAll("decades") double v) { same(v); }

    @Property(tries = 5_000)
    void everyQuantityInEitherSystemIsShownAsBefore(@ForAll("decades") double base) {
        for (UnitSystem system : UnitSystem.values())
            for (Quantity q : Quantity.values())
                assertThat(Display.of(base, q, system)).as("%s %s %s", base, q, system)
                        .isEqualTo(Sig3Reference.of(base, q, system));
    }

    @Property(tries = 10_000)
    void equationConstantsArePrintedAsBefore(@ForAll("constants") double v) { samePlain(v); }

    @Property(tries = 10_000)
    void anyBitPatternIsPrintedAsAConstantAsBefore(@ForAll("bitPatterns") double v) { samePlain(v); }

    @Example
    void edgeCasesAreShownAsBefore() {
        double[] edges = {0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.MIN_VALUE,
                -Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, -Double.MAX_VALUE, 9.995, 9.9949999, 9.996, 99.95,
                99.96, 999.5, 999.4999, 0.0009995, 0.125, 12.25, 12.35, -12.25, 0.1235, 1e-300, 1e-17, 1e-18, 1e-19,
                1e-20, -1e-17, 9.99e-17, 9.999e-19, 1e15, 1e19, 9.2e18, 9.3e18, 1e300, Long.MAX_VALUE, 100, 1000, 0.1,
                0.01, 1, -1, 0.5, 1.5, 2.5, 43945.3, 1.0 / 12, 29.545454, 0.99968, 12345, Math.nextDown(1.0),
                Math.nextUp(1.0), Math.nextDown(10.0), Math.nextDown(100.0), Math.nextDown(1000.0), Math.nextDown(0.1)};
        for (double v : edges) {
            same(v);
            same(Math.nextUp(v));
            same(Math.nextDown(v));
            samePlain(v);
        }
    }

    private static void same(double v) {
        assertThat(Display.sig3(v)).as("sig3(%s)", v).isEqualTo(Sig3Reference.sig3(v));
    }

    /** The same text, or the same refusal (BigDecimal takes no NaN or infinity). */
    private static void samePlain(double v) {
        String expected, actual;
        try { expected = Sig3Reference.plain(v); } catch (NumberFormatException e) { expected = "refused"; }
        try { actual = Display.plain(v); } catch (NumberFormatException e) { actual = "refused"; }
        assertThat(actual).as("plain(%s)", v).isEqualTo(expected);
    }

    @Provide
    Arbitrary<Double> bitPatterns() { return Arbitraries.longs().map(Double::longBitsToDouble); }

    /** m × 10^e for three- and four-figure m ending in 5 or any digit, and the doubles either side of it. */
    @Provide
    Arbitrary<Double> halves() {
        return Combinators.combine(Arbitraries.integers().between(100, 99_999), Arbitraries.integers().between(-22, 22),
                Arbitraries.integers().between(-2, 2), Arbitraries.of(1.0, -1.0))
                .as((m, e, step, sign) -> {
                    double v = sign * Double.parseDouble(m + "e" + e);
                    for (int i = 0; i < Math.abs(step); i++) v = step > 0 ? Math.nextUp(v) : Math.nextDown(v);
                    return v;
                });
    }

    /** A mantissa in [1, 10) at any decade from 1e-25 to 1e25, either sign, as a unit conversion might leave it. */
    @Provide
    Arbitrary<Double> decades() {
        return Combinators.combine(Arbitraries.doubles().between(1, 10).ofScale(12), Arbitraries.integers().between(-25, 25),
                Arbitraries.of(1.0, -1.0, 0.001, 144.0 / 1000.0, 12.0, 1000.0))
                .as((m, e, f) -> m * Math.pow(10, e) * f);
    }

    /** Factors and constants as equations print them: a few decimals, whole numbers, and ratios. */
    @Provide
    Arbitrary<Double> constants() {
        return Arbitraries.oneOf(Arbitraries.doubles().between(-1e7, 1e7).ofScale(4),
                Arbitraries.doubles().between(-10, 10).ofScale(17), Arbitraries.integers().map(i -> i / 7.0),
                Arbitraries.longs().map(l -> (double) l));
    }
}
