package com.baysheet.web.entry;

import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Roof slopes: fractions and decimals of in/ft (or %), pitches rise:run, percentages. */
class SlopesTest {
    @ParameterizedTest(name = "{0} → {1} in/ft")
    @CsvSource(delimiter = '|', value = {
            "6:12     | 6",         // 6 in of rise per 12 in of run
            "1/4      | 0.25",
            "1 1/2    | 1.5",
            "0.25     | 0.25",
            "1/4\"    | 0.25",
            "1/4 in/ft | 0.25",
            "1/2\"/ft | 0.5",
            "3 : 12   | 3",
            "1:50     | 0.24",        // 12 × 1/50
            "2%       | 0.24",        // 12 × 2/100
            "0        | 0"})
    void readsUsSlopes(String typed, double inPerFt) {
        assertThat(Slopes.read(typed, "Roof slope", UnitSystem.US)).isEqualTo(inPerFt);
    }

    @ParameterizedTest(name = "{0} → {1} %")
    @CsvSource(delimiter = '|', value = {"6:12 | 50", "1:50 | 2", "2 | 2", "2% | 2", "2.5 % | 2.5"})
    void readsSiSlopes(String typed, double percent) {
        assertThat(Slopes.read(typed, "Roof slope", UnitSystem.SI)).isEqualTo(percent);
    }

    @ParameterizedTest(name = "{0} refused: {1}")
    @CsvSource(delimiter = '|', value = {
            "-1/4     | cannot be negative",
            "6:0      | run greater than 0",
            "1/0      | denominator of 0",
            "6/12     | 6:12",
            "steep    | write a slope as",
            "1 5/4    | improper fraction",
            "''       | is required"})
    void refusesUsSlopes(String typed, String problem) {
        assertThatThrownBy(() -> Slopes.read(typed, "Roof slope", UnitSystem.US)).isInstanceOf(EntryRefused.class)
                .hasMessageContaining("Roof slope").hasMessageContaining("\"" + typed + "\"").hasMessageContaining(problem);
    }

    @org.junit.jupiter.api.Test
    void anInchMarkIsNotASiSlope() {
        assertThatThrownBy(() -> Slopes.read("1/4\"", "Roof slope", UnitSystem.SI)).hasMessageContaining("percent");
    }
}
