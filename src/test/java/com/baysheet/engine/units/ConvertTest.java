package com.baysheet.engine.units;

import org.junit.jupiter.api.Test;
import tech.units.indriya.unit.Units;

import javax.measure.IncommensurableException;
import javax.measure.Unit;
import java.math.BigDecimal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Conversion factors checked two ways: against the values printed in NIST SP 811 Appendix B.8 (to their
 * printed digits), and against the unit algebra of tech.units Indriya (the JSR 385 reference
 * implementation), built only from the exact definitions ft = 0.3048 m, lb = 0.45359237 kg, g = 9.80665 m/s².
 */
class ConvertTest {
    static final Unit<?> FOOT = Units.METRE.multiply(new BigDecimal("0.3048"));
    static final Unit<?> POUND_FORCE = Units.KILOGRAM.multiply(new BigDecimal("0.45359237"))
            .multiply(Units.METRE.divide(Units.SECOND.pow(2))).multiply(new BigDecimal("9.80665"));
    static final Unit<?> KILONEWTON = Units.NEWTON.multiply(1000);

    static double indriya(Unit<?> from, Unit<?> to) {
        try {
            return from.getConverterToAny(to).convert(1.0);
        } catch (IncommensurableException e) {
            throw new AssertionError("units of different dimensions: " + from + ", " + to, e);
        }
    }

    @Test
    void factorsMatchNistSp811AppendixB8() {
        // NIST SP 811 B.8: ft → m 0.3048 (exact); ft² → m² 9.290304 E-02 (exact); lbf → N 4.448222;
        // psf → Pa 4.788026 E+01; plf → N/m 1.459390 E+01; lbf·ft → N·m 1.355818
        assertThat(Convert.M_PER_FT).isEqualTo(0.3048);
        assertThat(Convert.SQM_PER_SQFT).isCloseTo(0.09290304, within(1e-15));
        assertThat(Convert.N_PER_LBF).isCloseTo(4.4482216, within(1e-7));
        assertThat(Convert.KPA_PER_PSF * 1000).isCloseTo(47.880259, within(1e-6));
        assertThat(Convert.KN_PER_M_PER_PLF * 1000).isCloseTo(14.593903, within(1e-6));
        assertThat(Convert.KNM_PER_LBFT * 1000).isCloseTo(1.3558179, within(1e-7));
    }

    @Test
    void lengthAndAreaAgreeWithIndriya() {
        assertThat(Convert.toSi(Quantity.LENGTH, 1)).isCloseTo(indriya(FOOT, Units.METRE), within(1e-15));
        assertThat(Convert.toSi(Quantity.AREA, 1)).isCloseTo(indriya(FOOT.pow(2), Units.SQUARE_METRE), within(1e-15));
    }

    @Test
    void forceAndPressureAgreeWithIndriya() {
        assertThat(Convert.toSi(Quantity.FORCE, 1)).isCloseTo(indriya(POUND_FORCE, KILONEWTON), within(1e-15));
        double psf = indriya(POUND_FORCE.divide(FOOT.pow(2)), Units.PASCAL.multiply(1000));
        assertThat(Convert.toSi(Quantity.PRESSURE, 1)).isCloseTo(psf, within(1e-14));
    }

    @Test
    void lineLoadMomentAndStiffnessAgreeWithIndriya() {
        assertThat(Convert.toSi(Quantity.LINE_LOAD, 1)).isCloseTo(indriya(POUND_FORCE.divide(FOOT), KILONEWTON.divide(Units.METRE)), within(1e-15));
        assertThat(Convert.toSi(Quantity.MOMENT, 1)).isCloseTo(indriya(POUND_FORCE.multiply(FOOT), KILONEWTON.multiply(Units.METRE)), within(1e-15));
        assertThat(Convert.toSi(Quantity.STIFFNESS, 1))
                .isCloseTo(indriya(POUND_FORCE.multiply(FOOT.pow(2)), KILONEWTON.multiply(Units.METRE.pow(2))), within(1e-15));
    }

    @Test
    void roofSlopeOfOneInchPerFootIsOneTwelfthOfOneHundredPercent() {
        // rise 1 in over a run of 12 in is 8.33 % (geometry)
        assertThat(Convert.toSi(Quantity.SLOPE, 1)).isCloseTo(100.0 / 12, within(1e-12));
    }

    @Test
    void toUsUndoesToSiAndBetweenIsIdentityWithinOneSystem() {
        for (Quantity q : Quantity.values()) {
            assertThat(Convert.toUs(q, Convert.toSi(q, 123.456))).isCloseTo(123.456, within(1e-10));
            assertThat(Convert.between(q, 7.5, UnitSystem.SI, UnitSystem.SI)).isEqualTo(7.5);
        }
        assertThat(Convert.between(Quantity.FORCE, 1000, UnitSystem.US, UnitSystem.SI)).isCloseTo(4.4482216, within(1e-7));
    }
}
