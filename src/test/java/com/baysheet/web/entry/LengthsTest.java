package com.baysheet.web.entry;

import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Feet and inches as engineers write them, read to ft (or in) exactly; and what must be refused. */
class LengthsTest {
    static final LengthField SPACING = LengthField.span("Spacings along x");
    static final LengthField ELEVATION = LengthField.elevation("Elevation");

    @ParameterizedTest(name = "{0} → {1} ft on a spacing")
    @CsvSource(delimiter = '|', value = {
            "25'-6\"     | 25.5",
            "25' 6\"     | 25.5",
            "25'6        | 25.5",
            "25' 6       | 25.5",
            "25.5        | 25.5",
            "25'         | 25",
            "6\"         | 0.5",
            "25-6        | 25.5",
            "25 - 6\"    | 25.5",
            "25 ft 6 in  | 25.5",
            "25′-6″      | 25.5",
            "25'-0\"     | 25",
            "25 1/2      | 25.5",
            "30          | 30"})
    void readsFeetAndInchesOnASpacing(String typed, double feet) {
        assertThat(Lengths.read(typed, SPACING, UnitSystem.US)).isEqualTo(feet);
    }

    @ParameterizedTest(name = "{0} refused on a spacing: {1}")
    @CsvSource(delimiter = '|', value = {
            "25'-13\"    | inches after feet must be less than 12",
            "25'-12\"    | inches after feet must be less than 12",
            "25-13       | inches after feet must be less than 12",
            "25'-6 1/0\" | denominator of 0",
            "--25        | more than one sign",
            "-25'        | cannot be negative",
            "0'-0\"      | must be greater than 0",
            "25.5'-6\"   | whole feet",
            "25'-6 5/4\" | improper fraction",
            "7.5 m       | not metres",
            "ten feet    | write a length as",
            "25-1/2      | write a length as"})
    void refusesOnASpacing(String typed, String problem) {
        assertThatThrownBy(() -> Lengths.read(typed, SPACING, UnitSystem.US)).isInstanceOf(EntryRefused.class)
                .hasMessageContaining("Spacings along x").hasMessageContaining("\"" + typed + "\"").hasMessageContaining(problem);
    }

    @ParameterizedTest(name = "{0} → {1} ft on an elevation")
    @CsvSource(delimiter = '|', value = {
            "-12'-6\"  | -12.5",
            "-12' 6\"  | -12.5",
            "-12.5     | -12.5",
            "+12'      | 12",
            "0         | 0",
            "-6\"      | -0.5"})
    void readsSignedElevations(String typed, double feet) {
        assertThat(Lengths.read(typed, ELEVATION, UnitSystem.US)).isEqualTo(feet);
    }

    @ParameterizedTest(name = "{0} refused on an elevation")
    @CsvSource(delimiter = '|', value = {"-12-6", "12-6", "-12--6", "-12'--6\""})
    void refusesADashedLengthOnASignedField(String typed) {
        assertThatThrownBy(() -> Lengths.read(typed, ELEVATION, UnitSystem.US)).isInstanceOf(EntryRefused.class)
                .hasMessageContaining("Elevation").hasMessageContaining(typed);
    }

    @org.junit.jupiter.api.Test
    void theDashedFormOnAnElevationSaysHowToWriteIt() {
        assertThatThrownBy(() -> Lengths.read("-12-6", ELEVATION, UnitSystem.US)).hasMessageContaining("-12'-6\"");
    }

    @org.junit.jupiter.api.Test
    void aHalfInchIsAddedAsTwelfthsOfAFoot() {
        assertThat(Lengths.read("25'-6 1/2\"", SPACING, UnitSystem.US)).isEqualTo(25 + 6.5 / 12);
        assertThat(Lengths.read("25' 6-1/2\"", SPACING, UnitSystem.US)).isEqualTo(25 + 6.5 / 12);
        assertThat(Lengths.read("-3'-1 1/4\"", ELEVATION, UnitSystem.US)).isEqualTo(-(3 + 1.25 / 12));
    }

    @org.junit.jupiter.api.Test
    void aSmallLengthIsReadInInches() {
        LengthField side = LengthField.small("Contact area side");
        assertThat(Lengths.read("2'-6\"", side, UnitSystem.US)).isEqualTo(30);
        assertThat(Lengths.read("30", side, UnitSystem.US)).isEqualTo(30);
        assertThat(Lengths.read("4 1/2\"", side, UnitSystem.US)).isEqualTo(4.5);
    }
}
