package com.baysheet.web.entry;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** A list of spacings split into one text per length, keeping feet, inches, fractions and units together. */
class LengthListTest {
    @Test
    void splitsAtSpacesKeepingEachLengthWhole() {
        assertThat(LengthList.split("30 30 25", "s")).containsExactly("30", "30", "25");
        assertThat(LengthList.split("25'-6\" 30' 24'-6 1/2\"", "s")).containsExactly("25'-6\"", "30'", "24'-6 1/2\"");
        assertThat(LengthList.split("25' 6\" 30' 6 1/2\"", "s")).containsExactly("25' 6\"", "30' 6 1/2\"");
        assertThat(LengthList.split("30 6 1/2\"", "s")).containsExactly("30", "6 1/2\"");
        assertThat(LengthList.split("7500 mm 7.5 m 8", "s")).containsExactly("7500 mm", "7.5 m", "8");
        assertThat(LengthList.split("25' 6 1/2\" 30", "s")).containsExactly("25' 6 1/2\"", "30");
    }

    @Test
    void splitsAtCommasOnlyWhenThereAreAny() {
        assertThat(LengthList.split("25' 6, 30', 24 ft", "s")).containsExactly("25' 6", "30'", "24 ft");
    }

    @Test
    void refusesAFootMarkFollowedByABareNumber() {
        assertThatThrownBy(() -> LengthList.split("25' 6 30'", "Spacings along x")).isInstanceOf(EntryRefused.class)
                .hasMessageContaining("Spacings along x").hasMessageContaining("25'-6\"");
    }
}
