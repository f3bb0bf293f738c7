package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Editions;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The floor method data sets and a project's choice of one. */
class FloorMethodsTest {
    final FloorMethods methods = FloorMethods.builtIn();

    @Test
    void everyDataSetNamesAnImplementationAndMarksEveryClause() {
        assertThat(methods.all()).extracting(MethodData::id).contains("ibc-2021-alternative", "en1991-recommended", "nbc-2020");
        for (MethodData d : methods.all()) {
            assertThat(d.clauses()).isNotEmpty();
            d.clauses().values().forEach(c -> assertThat(c.confidence()).isIn("seen", "memory", "uncertain"));
            CalcContext ctx = CalcContext.of(d.units().iterator().next()).withFloorMethod(d.id());
            assertThat(ReductionMethods.of(ctx).id()).isEqualTo(d.id());
        }
    }

    @Test
    void siOnlyMethodsAreRefusedOnAUsProject() {
        assertThatThrownBy(() -> CalcContext.of(UnitSystem.US).withFloorMethod("en1991-recommended"))
                .isInstanceOf(InputError.class).hasMessageContaining("floorMethod").hasMessageContaining("SI");
        assertThatThrownBy(() -> CalcContext.of(UnitSystem.US).withFloorMethod("nbc-2020")).isInstanceOf(InputError.class);
        assertThat(CalcContext.of(UnitSystem.US).withFloorMethod("ibc-2021-alternative").floorMethod()).isEqualTo("ibc-2021-alternative");
        assertThat(CalcContext.of(UnitSystem.SI).withFloorMethod("nbc-2020").floorMethod()).isEqualTo("nbc-2020");
    }

    @Test
    void unknownMethodIsRefusedNamingTheField() {
        assertThatThrownBy(() -> CalcContext.of(UnitSystem.US).withFloorMethod("asce-9"))
                .isInstanceOf(InputError.class).hasMessageContaining("floorMethod").hasMessageContaining("asce-9");
    }

    @Test
    void blankIsTheEditionsOwnMethod() {
        CalcContext ctx = CalcContext.of(UnitSystem.US).withFloorMethod(" ");
        assertThat(ctx.floorMethod()).isNull();
        assertThat(ReductionMethods.of(ctx).id()).isEqualTo(Editions.builtIn().byDefault().floorMethod());
    }

    @Test
    void othersListTheApplicableMethodsButTheProjectsOwn() {
        assertThat(ReductionMethods.others(CalcContext.of(UnitSystem.US)))
                .containsExactly("ibc-2021-alternative", "ibc-2018-alternative", "ibc-2015-alternative");
        assertThat(ReductionMethods.others(CalcContext.of(UnitSystem.SI).withFloorMethod("nbc-2020")))
                .contains("", "ibc-2021-alternative", "en1991-recommended", "en1991-uk-na").doesNotContain("nbc-2020");
    }
}
