package com.baysheet.engine;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class CheckTest {
    @Test
    void positiveRefusesZeroNegativeNaNAndInfinityNamingFieldAndValue() {
        for (double bad : new double[] {0, -1, Double.NaN, Double.POSITIVE_INFINITY})
            assertThatThrownBy(() -> Check.positive("span", bad)).isInstanceOf(InputError.class)
                    .hasMessageContaining("span").hasMessageContaining(String.valueOf(bad));
        assertThat(Check.positive("span", 3.5)).isEqualTo(3.5);
    }

    @Test
    void nonNegativeAcceptsZeroButNotNegativeOrNaN() {
        assertThat(Check.nonNegative("dead", 0)).isZero();
        assertThatThrownBy(() -> Check.nonNegative("dead", -0.1)).isInstanceOf(InputError.class);
        assertThatThrownBy(() -> Check.nonNegative("dead", Double.NaN)).isInstanceOf(InputError.class);
    }

    @Test
    void inputErrorKeepsFieldValueAndProblemApart() {
        InputError e = new InputError("floorsSupported", 0, "must be at least 1");
        assertThat(e.field()).isEqualTo("floorsSupported");
        assertThat(e.value()).isEqualTo("0");
        assertThat(e.problem()).isEqualTo("must be at least 1 (got 0)");
        assertThat(e).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void withinRefusesValuesOutsideItsBounds() {
        assertThat(Check.within("slope", 12, 0, 24)).isEqualTo(12);
        assertThatThrownBy(() -> Check.within("slope", 25, 0, 24)).isInstanceOf(InputError.class).hasMessageContaining("25");
    }
}
