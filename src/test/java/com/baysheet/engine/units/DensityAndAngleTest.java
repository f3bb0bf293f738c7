package com.baysheet.engine.units;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The quantities the roof snow chapter adds: snow density and slope angle. */
class DensityAndAngleTest {
    @Test
    void poundPerCubicFootInKilonewtonPerCubicMetre() {
        // NIST SP 811 B.8: 1 lbf/ft³ = 157.0875 N/m³ (4.4482216 N / 0.3048³ m³)
        assertThat(Convert.toSi(Quantity.DENSITY, 1)).isCloseTo(0.1570875, within(1e-7));
        // 30 pcf, the cap of ASCE 7-16 Eq. 7.7-1, is 4.713 kN/m³; the code prints 4.7 (from memory)
        assertThat(Convert.toSi(Quantity.DENSITY, 30)).isCloseTo(4.7126, within(1e-4));
    }

    @Test
    void anglesAreDegreesInBothSystems() {
        assertThat(Convert.toSi(Quantity.ANGLE, 30)).isEqualTo(30);
        assertThat(Display.of(17.9, Quantity.DENSITY, UnitSystem.US)).isEqualTo("17.9 pcf");
        assertThat(Display.of(2.81, Quantity.DENSITY, UnitSystem.SI)).isEqualTo("2.81 kN/m³");
        assertThat(Display.of(18.43, Quantity.ANGLE, UnitSystem.US)).isEqualTo("18.4 °");
    }
}
