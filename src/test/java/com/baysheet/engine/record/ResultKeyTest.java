package com.baysheet.engine.record;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** A result key reads and writes the record's text "case.action" unchanged. */
class ResultKeyTest {
    @Test
    void theTextIsCaseDotActionAndParsesBack() {
        assertThat(ResultKey.of("LRFD", "M+").text()).isEqualTo("LRFD.M+");
        assertThat(ResultKey.axial("D").text()).isEqualTo("D.P");
        assertThat(ResultKey.of("L0", "RA,min").text()).isEqualTo("L0.RA,min");
        // the action may hold a dot of its own: the case ends at the first one
        assertThat(ResultKey.parse("snow.drift.w")).isEqualTo(ResultKey.of("snow", "drift.w"));
        assertThat(ResultKey.parse("ASD.M−")).isEqualTo(ResultKey.of("ASD", "M−"));
    }

    @Test
    void aCaseWithADotOrNoActionIsRefused() {
        assertThatThrownBy(() -> ResultKey.of("1.2D", "M+")).hasMessageContaining("loadCase");
        assertThatThrownBy(() -> ResultKey.of("LRFD", " ")).hasMessageContaining("action");
        assertThatThrownBy(() -> ResultKey.parse("total")).hasMessageContaining("case.action");
    }

    @Test
    void aRecordIsReadByTheKeyItWasWrittenWith() {
        CalcRecord r = new RecordBuilder("B1", "ASCE 7-16", com.baysheet.engine.units.UnitSystem.US)
                .result(ResultKey.axial("LRFD"), "Factored", 1200, com.baysheet.engine.units.Quantity.FORCE)
                .governs(ResultKey.axial("LRFD")).build();
        assertThat(r.result(ResultKey.axial("LRFD"))).isEqualTo(1200.0);
        assertThat(r.result("LRFD.P")).isEqualTo(1200.0);
        assertThat(r.governing()).containsExactly("LRFD.P");
        assertThat(r.result(ResultKey.axial("ASD"))).isNaN();
    }
}
