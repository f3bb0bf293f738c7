package com.baysheet.sheet;

import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberLabel;
import com.baysheet.framing.MemberRole;
import com.baysheet.framing.schedule.LoadSchedule;
import com.baysheet.framing.schedule.MarkSchedule;
import com.baysheet.review.MarkSheets;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Plans, take-downs and schedules print each member's mark, the very mark its sheet is under. */
class MarkLabelsTest {
    static final Derived D = SheetFixtures.building();
    static final MarkSheets MARKS = MarkSheets.fresh(D);
    static final CalcPackage PKG = FramingSheets.projectOf(SheetFixtures.header("Project"), D, List.of(),
            MARKS.all().stream().map(s -> FramingSheets.typical(SheetFixtures.header(s.text()), D, s.group(), s.text())).toList(),
            MARKS.labels());

    @Test
    void everyPlanLabelsEachMemberWithTheMarkOfItsSheet() {
        assertThat(PKG.plans()).isNotEmpty();
        for (FramingPlan p : PKG.plans()) {
            List<String> expected = D.onLevel(p.level()).stream().map(m -> MARKS.ofMember(m.id()).orElseThrow().text()).toList();
            assertThat(p.members()).extracting(FramingPlan.Member::label).containsExactlyElementsOf(expected);
        }
        // typical members share a mark: the plans print fewer distinct labels than members
        long distinct = PKG.plans().stream().flatMap(p -> p.members().stream()).map(FramingPlan.Member::label).distinct().count();
        assertThat(distinct).isEqualTo(MARKS.all().size()).isLessThan(D.members().size());
    }

    @Test
    void theColumnScheduleAndTakeDownsNameEachColumnByItsMarkBesideItsPlace() {
        LoadSchedule columns = PKG.schedules().get(0);
        List<String> names = new ArrayList<>();
        for (List<Object> row : columns.rows()) names.add((String) row.get(0));
        for (DerivedMember c : D.members()) {
            if (c.role() != MemberRole.COLUMN) continue;
            String expected = MARKS.ofMember(c.id()).orElseThrow().text() + " (" + MemberLabel.of(c) + ")";
            assertThat(names).contains(expected);
            assertThat(PKG.takeDowns()).anySatisfy(t -> assertThat(t.rows()).anySatisfy(r -> assertThat(r.get(1)).isEqualTo(expected)));
        }
    }

    @Test
    void theMarkScheduleHasOneRowPerBeamAndGirderMarkWithItsCountAndTheRecordValues() {
        LoadSchedule s = PKG.schedules().get(2);
        assertThat(s.key()).isEqualTo("marks");
        List<MarkSheets.MarkSheet> beams = MARKS.all().stream().filter(m -> m.group().role() != MemberRole.COLUMN).toList();
        assertThat(s.rows()).hasSize(beams.size());
        for (MarkSheets.MarkSheet m : beams) {
            List<Object> row = s.rows().stream().filter(x -> x.get(0).equals(m.text())).findFirst().orElseThrow();
            assertThat(row.get(1)).isEqualTo(Integer.toString(m.group().members().size()));
            for (String location : m.group().locations()) assertThat((String) row.get(2)).contains(location);
            // the members of a mark are calculated once: the row is the record's own values
            assertThat(row.get(s.column("M_u+"))).isEqualTo(m.group().first().result().value("LRFD.M+"));
            assertThat(row.get(s.column("W D"))).isEqualTo(m.group().first().result().stepValue("W.D"));
            assertThat(row.get(s.column("Span"))).isEqualTo(m.group().first().span());
        }
    }

    @Test
    void aLevelsMarkScheduleCountsOnlyThatLevelsMembers() {
        String level = D.members().get(0).level();
        LoadSchedule s = MarkSchedule.onLevel(D, level, MARKS.labels());
        int counted = s.rows().stream().mapToInt(r -> Integer.parseInt((String) r.get(1))).sum();
        assertThat(counted).isEqualTo((int) D.onLevel(level).stream().filter(m -> m.role() != MemberRole.COLUMN).count());
    }
}
