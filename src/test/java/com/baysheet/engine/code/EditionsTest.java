package com.baysheet.engine.code;

import com.baysheet.engine.InputError;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class EditionsTest {
    static final Edition ASCE_7_16 = Editions.builtIn().get("ASCE 7-16");

    // ASCE 7-16 Table 4.7-1, live load element factor K_LL, every member row [seen]
    @ParameterizedTest(name = "{0}: K_LL = {1}")
    @CsvSource({
            "INTERIOR_COLUMN, 4", "EXTERIOR_COLUMN, 4", "EDGE_COLUMN_CANTILEVER, 3", "CORNER_COLUMN_CANTILEVER, 2",
            "EDGE_BEAM, 2", "INTERIOR_BEAM, 2", "EDGE_BEAM_CANTILEVER, 1", "CANTILEVER_BEAM, 1",
            "ONE_WAY_SLAB, 1", "TWO_WAY_SLAB, 1", "NO_SHEAR_TRANSFER, 1"})
    void liveLoadElementFactorMatchesTable4_7_1(MemberKind kind, double kll) {
        assertThat(ASCE_7_16.kll(kind)).isEqualTo(kll);
    }

    @Test
    void everyEditionGivesTheSameElementFactorsAndItsOwnTableLabel() {
        for (String id : Editions.builtIn().ids()) {
            Edition e = Editions.builtIn().get(id);
            for (MemberKind k : MemberKind.values()) assertThat(e.kll(k)).as(id + " " + k).isEqualTo(ASCE_7_16.kll(k));
        }
        // ASCE 7-10 numbers the K_LL table 4-2 (REFERENCES.md, clause numbers by edition)
        assertThat(Editions.builtIn().get("ASCE 7-10").clause("reduction.kll").ref()).isEqualTo("Table 4-2");
        assertThat(ASCE_7_16.clause("reduction.kll").ref()).isEqualTo("Table 4.7-1");
    }

    @Test
    void equationConstantsAreThoseOfEq4_7_1AndSection4_8_2() {
        // ASCE 7-16 Eq. 4.7-1: 0.25 + 15/sqrt(K_LL A_T) (US), 4.57 (SI); threshold 400 ft² (37.16 m²); limits 0.50, 0.40
        assertThat(ASCE_7_16.constant("reduction.base")).isEqualTo(0.25);
        assertThat(ASCE_7_16.constant("reduction.coef.us")).isEqualTo(15);
        assertThat(ASCE_7_16.constant("reduction.coef.si")).isEqualTo(4.57);
        assertThat(ASCE_7_16.constant("threshold.us")).isEqualTo(400);
        assertThat(ASCE_7_16.constant("threshold.si")).isEqualTo(37.16);
        assertThat(ASCE_7_16.constant("limit.oneFloor")).isEqualTo(0.5);
        assertThat(ASCE_7_16.constant("limit.multiFloor")).isEqualTo(0.4);
        // ASCE 7-16 4.8.2: 12 <= Lr <= 20 psf; R2 = 1.2 - 0.05 F (one public copy misprints 0.05 as 0.01)
        assertThat(ASCE_7_16.constant("roof.min.us")).isEqualTo(12);
        assertThat(ASCE_7_16.constant("roof.max.us")).isEqualTo(20);
        assertThat(ASCE_7_16.constant("r2.coef")).isEqualTo(0.05);
    }

    @Test
    void clauseCarriesEditionAndConfidence() {
        assertThat(ASCE_7_16.clause("reduction.assembly").label()).isEqualTo("ASCE 7-16 4.7.5");
        assertThat(ASCE_7_16.clause("reduction.heavy").confidence()).isEqualTo("memory");
        assertThat(ASCE_7_16.clause("reduction.eq").confidence()).isEqualTo("seen");
    }

    @Test
    void unknownEditionIsAnInputErrorNamingIt() {
        assertThatThrownBy(() -> Editions.builtIn().get("ASCE 7-98"))
                .isInstanceOf(InputError.class).hasMessageContaining("edition").hasMessageContaining("ASCE 7-98");
        assertThat(Editions.builtIn().byDefault().id()).isEqualTo("ASCE 7-16");
    }

    @Test
    void memberKindParsesByNameAndRefusesOthers() {
        assertThat(MemberKind.parse("kind", "interior_beam")).isEqualTo(MemberKind.INTERIOR_BEAM);
        assertThat(MemberKind.INTERIOR_COLUMN.isColumn()).isTrue();
        assertThatThrownBy(() -> MemberKind.parse("kind", "JOIST")).isInstanceOf(InputError.class).hasMessageContaining("JOIST").hasMessageContaining("live load element factor table");
    }
}
