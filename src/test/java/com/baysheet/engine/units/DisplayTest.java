package com.baysheet.engine.units;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

class DisplayTest {
    @Test
    void showsThreeSignificantFigures() {
        assertThat(Display.sig3(29.545454)).isEqualTo("29.5");
        assertThat(Display.sig3(0.99968)).isEqualTo("1.00");
        assertThat(Display.sig3(0.0123456)).isEqualTo("0.0123");
        assertThat(Display.sig3(12345)).isEqualTo("12300");
        assertThat(Display.sig3(-12.5)).isEqualTo("-12.5");
        assertThat(Display.sig3(0)).isEqualTo("0");
    }

    @Test
    void roundingThatCarriesIntoTheNextDecadeKeepsThreeFigures() {
        assertThat(Display.sig3(9.996)).isEqualTo("10.0");
        assertThat(Display.sig3(99.96)).isEqualTo("100");
    }

    @Test
    void equationConstantsArePrintedWithoutTrailingZeros() {
        assertThat(Display.plain(15)).isEqualTo("15");
        assertThat(Display.plain(4.57)).isEqualTo("4.57");
        assertThat(Display.plain(0.25)).isEqualTo("0.25");
    }

    @Test
    void showsBaseValuesInSheetUnits() {
        assertThat(Display.of(43945.3, Quantity.MOMENT, UnitSystem.US)).isEqualTo("43.9 kip·ft");
        assertThat(Display.of(0.5, Quantity.SMALL_LENGTH, UnitSystem.SI)).isEqualTo("500 mm");
        assertThat(Display.of(1.0 / 12, Quantity.SMALL_LENGTH, UnitSystem.US)).isEqualTo("1.00 in");
    }
}
