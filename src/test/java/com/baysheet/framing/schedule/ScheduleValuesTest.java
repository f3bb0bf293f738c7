package com.baysheet.framing.schedule;

import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberLabel;
import com.baysheet.framing.MemberRole;
import com.baysheet.framing.TakeDown;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.SelfWeights;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The schedules copy their numbers from the take-downs and the members' records, and nothing else. */
class ScheduleValuesTest {
    static final Derived D = officeUnderRoof();

    /** Three bays by two, an office floor under a roof, infill beams spanning in x, self weights on. */
    static Derived officeUnderRoof() {
        Grid g = new Grid(new GridAxis("x", List.of("1", "2", "3", "4"), List.of(30.0, 30.0, 30.0)),
                new GridAxis("y", List.of("A", "B", "C"), List.of(25.0, 25.0)));
        List<Bay> floor = new ArrayList<>(), roof = new ArrayList<>();
        for (int c = 0; c < 3; c++)
            for (int r = 0; r < 2; r++) {
                floor.add(Bay.floor(c, r, "office", 65, new Framing(Direction.X, 2)));
                roof.add(Bay.floor(c, r, "roof-ordinary", 25, new Framing(Direction.X, 2)));
            }
        return Derivation.derive(new Building("Elm Street Offices", CalcContext.of(UnitSystem.US), g,
                List.of(Level.floor("Level 2", 14, floor), Level.roof("Roof", 28, 0.25, roof)))
                .withSelfWeights(new SelfWeights(10, 20, 40, 60, "firm default")));
    }

    @Test
    void theColumnScheduleIsEachTakeDownRowThenTheBase() {
        LoadSchedule s = ColumnSchedules.loads(D);
        int k = 0;
        for (TakeDown t : D.takeDowns()) {
            for (TakeDown.Row r : t.rows()) assertRow(s.rows().get(k++), "below " + r.level(), r, s);
            assertRow(s.rows().get(k++), "base", t.rows().get(t.rows().size() - 1), s);
        }
        assertThat(s.rows()).hasSize(k);
        assertThat(s.heading(s.column("D"))).isEqualTo("D (kip)");
        assertThat(s.shown(0, s.column("D"))).isEqualTo((Double) s.rows().get(0).get(s.column("D")) / 1000);
    }

    private static void assertRow(List<Object> row, String at, TakeDown.Row r, LoadSchedule s) {
        assertThat(row.get(1)).isEqualTo(at);
        assertThat(row.get(0)).isEqualTo(MemberLabel.of(D.member(r.member()).orElseThrow()));
        assertThat(row.get(s.column("D"))).isEqualTo(r.dead());
        assertThat(row.get(s.column("L"))).isEqualTo(r.liveReduced());
        assertThat(row.get(s.column("Lr"))).isEqualTo(r.roofLive());
        assertThat(row.get(s.column("Service"))).isEqualTo(r.asd());
        assertThat(row.get(s.column("Service combination"))).isEqualTo(r.asdCombination());
        assertThat(row.get(s.column("Factored"))).isEqualTo(r.lrfd());
        assertThat(row.get(s.column("Factored combination"))).isEqualTo(r.lrfdCombination());
    }

    @Test
    void noSnowColumnWithoutSnowAndTheRoofLiveColumnWhereARoofCarriesIt() {
        List<String> headings = ColumnSchedules.foundations(D).columns().stream().map(LoadSchedule.Column::heading).toList();
        assertThat(headings).contains("Lr").doesNotContain("S");
    }

    @Test
    void theMemberScheduleReadsEachMembersRecord() {
        LoadSchedule s = MemberSchedule.of(D);
        List<DerivedMember> beams = D.members().stream().filter(m -> m.role() != MemberRole.COLUMN).toList();
        assertThat(s.rows()).hasSize(beams.size());
        for (int r = 0; r < beams.size(); r++) {
            DerivedMember m = beams.get(r);
            List<Object> row = s.rows().get(r);
            assertThat(row.subList(0, 3)).containsExactly(m.level(), MemberLabel.of(m), "1");
            assertThat(row.get(s.column("Span"))).isEqualTo(m.span());
            assertThat(row.get(s.column("W D"))).isEqualTo(m.result().record().step("W.D").result());
            assertThat(row.get(s.column("R_A factored"))).isEqualTo(m.result().record().result("LRFD.RA"));
            assertThat(row.get(s.column("R_B service"))).isEqualTo(m.result().record().result("ASD.RB"));
            assertThat(row.get(s.column("V_u"))).isEqualTo(m.result().record().result("LRFD.V"));
            assertThat(row.get(s.column("M_u+"))).isEqualTo(m.result().record().result("LRFD.M+"));
        }
    }

    @Test
    void membersSharingALabelAreOneRowWithTheirCountAndTheWorstOfEachValue() {
        LoadSchedule s = MemberSchedule.of(D, m -> true, m -> m.role().name());
        int girder = -1;
        for (int r = 0; r < s.rows().size(); r++)
            if (s.rows().get(r).get(1).equals("GIRDER") && s.rows().get(r).get(0).equals("Level 2")) girder = r;
        List<DerivedMember> girders = D.onLevel("Level 2").stream().filter(m -> m.role() == MemberRole.GIRDER).toList();
        assertThat(s.rows().get(girder).get(2)).isEqualTo(Integer.toString(girders.size()));
        double worst = girders.stream().mapToDouble(m -> m.result().value("LRFD.M+")).max().orElseThrow();
        assertThat(s.rows().get(girder).get(s.column("M_u+"))).isEqualTo(worst);
    }

    @Test
    void aRowThatDoesNotMatchItsColumnsIsRefusedByName() {
        var cols = List.of(LoadSchedule.Column.text("Column"), new LoadSchedule.Column("D", com.baysheet.engine.units.Quantity.FORCE));
        assertThatThrownBy(() -> new LoadSchedule("x", "X", com.baysheet.engine.units.UnitSystem.US, cols, List.of(List.of("A", "1")), List.of()))
                .hasMessageContaining("rows[0][D]");
        assertThatThrownBy(() -> new LoadSchedule("x", "X", com.baysheet.engine.units.UnitSystem.US, cols, List.of(List.of("A")), List.of()))
                .hasMessageContaining("rows[0]");
    }
}
