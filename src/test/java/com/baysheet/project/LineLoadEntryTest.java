package com.baysheet.project;

import com.baysheet.engine.InputError;
import org.junit.jupiter.api.Test;

import java.util.Map;
import java.util.function.Supplier;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** A line load entry refuses what can never be a load, naming the field, before the store is asked. */
class LineLoadEntryTest {
    static LineLoadEntry perLength(double dead, double live) {
        return new LineLoadEntry(null, "A", "1", "5", "wall", dead, Double.NaN, Double.NaN, live, live > 0 ? "office" : null, false);
    }

    static LineLoadEntry cladding(double pressure, double height) {
        return new LineLoadEntry(null, "A", "1", "5", "cladding", Double.NaN, pressure, height, 0, null, false);
    }

    @Test
    void claddingIsItsWeightPerAreaTimesItsHeight() {
        // 15 psf × 13 ft = 195 plf
        assertThat(cladding(15, 13).deadLoad()).isEqualTo(195.0);
        assertThat(perLength(400, 0).deadLoad()).isEqualTo(400.0);
    }

    @Test
    void negativeNonFiniteAndMixedLoadsAreRefusedNamingTheField() {
        Map<String, Supplier<LineLoadEntry>> refused = Map.ofEntries(
                Map.entry("dead", () -> perLength(-1, 0)),
                Map.entry("live", () -> perLength(100, Double.NaN)),
                Map.entry("deadPressure", () -> cladding(Double.POSITIVE_INFINITY, 10)),
                Map.entry("height", () -> cladding(15, 0)),
                Map.entry("to", () -> new LineLoadEntry(null, "A", "1", "1", "x", 100, Double.NaN, Double.NaN, 0, null, false)),
                Map.entry("label", () -> new LineLoadEntry(null, "A", "1", "2", " ", 100, Double.NaN, Double.NaN, 0, null, false)),
                Map.entry("liveOccupancy", () -> new LineLoadEntry(null, "A", "1", "2", "x", 0, Double.NaN, Double.NaN, 50, null, false)),
                Map.entry("axis", () -> new LineLoadEntry("z", "A", "1", "2", "x", 100, Double.NaN, Double.NaN, 0, null, false)));
        for (var e : refused.entrySet())
            assertThatThrownBy(() -> e.getValue().get()).as(e.getKey())
                    .isInstanceOfSatisfying(InputError.class, err -> assertThat(err.field()).isEqualTo(e.getKey()));
        // both ways of giving the dead load at once, an overflowing product, and no load at all
        assertThatThrownBy(() -> new LineLoadEntry(null, "A", "1", "2", "x", 100, 15, 10, 0, null, false))
                .isInstanceOfSatisfying(InputError.class, err -> assertThat(err.field()).isEqualTo("dead"));
        assertThatThrownBy(() -> cladding(1e200, 1e200))
                .isInstanceOfSatisfying(InputError.class, err -> assertThat(err.field()).isEqualTo("height"));
        assertThatThrownBy(() -> perLength(0, 0))
                .isInstanceOfSatisfying(InputError.class, err -> assertThat(err.field()).isEqualTo("dead"));
    }
}
