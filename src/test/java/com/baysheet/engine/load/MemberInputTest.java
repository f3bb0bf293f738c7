package com.baysheet.engine.load;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.MemberKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** Bad input is refused with the field and the value named: never clamped. */
class MemberInputTest {
    static final List<AreaStrip> STRIP = List.of(new AreaStrip("office", 10, 0, 20, 15));

    static void refused(String field, String value, Executable e) {
        InputError err = assertThrows(InputError.class, e);
        assertThat(err.field()).isEqualTo(field);
        assertThat(err.getMessage()).contains(value);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, -3, 0})
    void spansMustBeFinitePositive(double bad) {
        refused("span", String.valueOf(bad), () -> new Support.Simple(bad));
        refused("overhang", String.valueOf(bad), () -> new Support.Overhang(10, bad));
        refused("length", String.valueOf(bad), () -> new Support.Cantilever(bad));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, -100, 0})
    void areasAndWidthsMustBeFinitePositive(double bad) {
        refused("area", String.valueOf(bad), () -> new AreaLoad("office", bad, 10));
        refused("width", String.valueOf(bad), () -> new AreaStrip("office", bad, 0, 10, 10));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.NEGATIVE_INFINITY, -1})
    void loadsMustBeFiniteAndNotNegative(double bad) {
        refused("deadPressure", String.valueOf(bad), () -> new AreaStrip("office", 10, 0, 10, bad));
        refused("deadPressure", String.valueOf(bad), () -> new AreaLoad("office", 100, bad));
        refused("dead", String.valueOf(bad), () -> new PointLoad(2, bad, List.of(), List.of()));
        refused("live", String.valueOf(bad), () -> new LiveShare("office", false, bad));
        refused("x", String.valueOf(bad), () -> new PointLoad(bad, 100, List.of(), List.of()));
        refused("selfWeight", String.valueOf(bad), () -> new MemberInput("B", MemberKind.INTERIOR_BEAM, new Support.Simple(20), 1,
                STRIP, List.of(), List.of(), bad, Double.NaN, Double.NaN, false));
    }

    @Test
    void floorsSupportedBelowOneIsRefused() {
        refused("floorsSupported", "0", () -> MemberInput.column("C", MemberKind.INTERIOR_COLUMN, 0, List.of(new AreaLoad("office", 100, 0))));
        refused("floorsSupported", "-2", () -> MemberInput.column("C", MemberKind.INTERIOR_COLUMN, -2, List.of(new AreaLoad("office", 100, 0))));
    }

    @Test
    void aBeamSupportsOneFloor() {
        refused("floorsSupported", "2", () -> new MemberInput("B", MemberKind.INTERIOR_BEAM, new Support.Simple(20), 2,
                STRIP, List.of(), List.of(), 0, Double.NaN, Double.NaN, false));
    }

    @Test
    void pointLoadOffTheSpanIsRefused() {
        refused("pointLoads[0].x", "25", () -> MemberInput.beam("B", MemberKind.INTERIOR_BEAM, new Support.Simple(20), STRIP)
                .withPointLoads(List.of(new PointLoad(25, 1000, List.of(), List.of()))));
    }

    @Test
    void stripPastTheEndOrBackwardsIsRefused() {
        refused("strips[0].to", "22", () -> MemberInput.beam("B", MemberKind.INTERIOR_BEAM, new Support.Simple(20),
                List.of(new AreaStrip("office", 10, 0, 22, 15))));
        refused("to", "4", () -> new AreaStrip("office", 10, 5, 4, 15));
    }

    @Test
    void supportMustSuitTheMemberKind() {
        refused("support", "Axial", () -> new MemberInput("B", MemberKind.INTERIOR_BEAM, new Support.Axial(), 1,
                List.of(), List.of(new AreaLoad("office", 100, 0)), List.of(), 0, Double.NaN, Double.NaN, false));
        refused("support", "Simple", () -> new MemberInput("C", MemberKind.INTERIOR_COLUMN, new Support.Simple(10), 1,
                STRIP, List.of(), List.of(), 0, Double.NaN, Double.NaN, false));
    }

    @Test
    void aMemberNeedsALoad() {
        refused("loads", "none", () -> MemberInput.beam("B", MemberKind.INTERIOR_BEAM, new Support.Simple(20), List.of()));
    }

    @Test
    void stiffnessAndRoofSlopeAreOptionalButNeverZeroOrNegative() {
        refused("stiffness", "0.0", () -> new MemberInput("B", MemberKind.INTERIOR_BEAM, new Support.Simple(20), 1,
                STRIP, List.of(), List.of(), 0, Double.NaN, 0, false));
        refused("roofSlope", "-1.0", () -> MemberInput.beam("B", MemberKind.INTERIOR_BEAM, new Support.Simple(20), STRIP).withRoofSlope(-1));
    }

    @Test
    void subjectAndOccupancyAreRequired() {
        assertThatThrownBy(() -> MemberInput.beam(" ", MemberKind.INTERIOR_BEAM, new Support.Simple(20), STRIP))
                .isInstanceOf(InputError.class).hasMessageContaining("subject");
        refused("occupancy", "\"\"", () -> new AreaStrip("", 10, 0, 10, 0));
    }

    @Test
    void overhangLengthIsBackSpanPlusOverhang() {
        assertThat(new Support.Overhang(20, 5).length()).isEqualTo(25);
        assertThat(new Support.Overhang(20, 5).span()).isEqualTo(20);
        assertThat(new Support.Cantilever(6).span()).isEqualTo(6);
    }
}
