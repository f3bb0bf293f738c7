package com.baysheet.web.entry;

import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** SI lengths: a bare number in the field's unit (m for spans and elevations, mm for a contact side), or an explicit m or mm. */
class MetricLengthsTest {
    static final LengthField SPACING = LengthField.span("Spacings along y");
    static final LengthField SIDE = LengthField.small("Contact area side");

    @ParameterizedTest(name = "{0} → {1} m on a spacing")
    @CsvSource(delimiter = '|', value = {"7500 mm | 7.5", "7.5 m | 7.5", "7.5 | 7.5", "7500mm | 7.5", "7.5m | 7.5", "250 mm | 0.25"})
    void readsMetresOnASpacing(String typed, double metres) {
        assertThat(Lengths.read(typed, SPACING, UnitSystem.SI)).isEqualTo(metres);
    }

    @ParameterizedTest(name = "{0} → {1} mm on a contact side")
    @CsvSource(delimiter = '|', value = {"750 | 750", "750 mm | 750", "0.75 m | 750"})
    void readsMillimetresOnASmallLength(String typed, double mm) {
        assertThat(Lengths.read(typed, SIDE, UnitSystem.SI)).isEqualTo(mm);
    }

    @ParameterizedTest(name = "{0} refused on an SI spacing: {1}")
    @CsvSource(delimiter = '|', value = {
            "7500     | over a kilometre",
            "25'-6\"  | not feet and inches",
            "7.5 km   | write a length as",
            "-7.5 m   | cannot be negative",
            "0 mm     | greater than 0",
            "1/2 m    | write a length as"})
    void refusesOnAnSiSpacing(String typed, String problem) {
        assertThatThrownBy(() -> Lengths.read(typed, SPACING, UnitSystem.SI)).isInstanceOf(EntryRefused.class)
                .hasMessageContaining("Spacings along y").hasMessageContaining(typed).hasMessageContaining(problem);
    }

    @org.junit.jupiter.api.Test
    void anElevationMayBeBelowGradeInMillimetres() {
        assertThat(Lengths.read("-1500 mm", LengthField.elevation("Elevation"), UnitSystem.SI)).isEqualTo(-1.5);
    }
}
