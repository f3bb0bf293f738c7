package com.baysheet.review;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.Derived;
import com.baysheet.framing.MemberRole;
import com.baysheet.framing.TypicalGroup;
import com.baysheet.framing.Typicals;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Typical members and their marks: grouped by calculation, numbered in reading order, never renumbered. */
class MarkAssignmentTest {
    /** Four bays by two of office floor, infill beams in x; {@code heavier} bays (col,row) carry 20 psf more dead load. */
    static Derived building(int... heavier) {
        return building(20, heavier);
    }

    /** As {@link #building(int...)}, the heavier bays carrying {@code more} psf more. */
    static Derived building(double more, int... heavier) {
        Grid g = new Grid(new GridAxis("x", List.of("1", "2", "3", "4", "5"), List.of(30.0, 30.0, 30.0, 30.0)),
                new GridAxis("y", List.of("A", "B", "C"), List.of(25.0, 25.0)));
        List<Bay> floor = new ArrayList<>();
        for (int c = 0; c < 4; c++)
            for (int r = 0; r < 2; r++) {
                double dead = 65;
                for (int k = 0; k < heavier.length; k += 2) if (heavier[k] == c && heavier[k + 1] == r) dead += more;
                floor.add(Bay.floor(c, r, "office", dead, new Framing(Direction.X, 2)));
            }
        return Derivation.derive(new Building("Typical Offices", CalcContext.of(UnitSystem.US), g,
                List.of(Level.floor("Level 2", 14, floor))));
    }

    /** What a model write stores: the assignment with every new mark given an id, and who carries which. */
    record Stored(List<Mark> marks, Map<String, Long> carried, Map<String, String> textOf) {
        static Stored after(Derived d, Stored before) {
            MarkAssignment.Result r = MarkAssignment.of(Typicals.of(d), before.marks, before.carried);
            List<Mark> marks = new ArrayList<>(r.retired());
            Map<String, Long> carried = new HashMap<>();
            Map<String, String> text = new HashMap<>();
            long next = before.marks.stream().mapToLong(Mark::id).max().orElse(0) + 1;
            for (MarkAssignment.Assigned a : r.assigned()) {
                Mark m = a.mark();
                if (m.id() == 0) m = new Mark(next++, m.prefix(), m.seq(), m.text(), m.calc(), m.originId(), true);
                marks.add(m);
                for (String id : a.group().memberIds()) { carried.put(id, m.id()); text.put(id, m.text()); }
            }
            return new Stored(marks, carried, text);
        }

        static Stored none() { return new Stored(List.of(), Map.of(), Map.of()); }
    }

    @Test
    void identicalMembersAreOneGroupAndEveryMemberIsInExactlyOne() {
        Derived d = building();
        List<TypicalGroup> groups = Typicals.of(d);
        assertThat(groups.stream().mapToInt(g -> g.members().size()).sum()).isEqualTo(d.members().size());
        assertThat(groups.size()).isLessThan(d.members().size());
        TypicalGroup beams = groups.stream().filter(g -> g.role() == MemberRole.INFILL_BEAM).findFirst().orElseThrow();
        assertThat(beams.members()).as("every infill beam of identical bays is one typical beam (8 bays, 2 each)").hasSize(16);
        for (TypicalGroup g : groups) {
            var first = g.first().result().record();
            for (var m : g.members())
                assertThat(m.result().record().withSubject(first.subject())).as(m.id()).isEqualTo(first);
        }
    }

    @Test
    void marksAreNumberedByPrefixInReadingOrder() {
        Stored s = Stored.after(building(), Stored.none());
        List<String> texts = s.marks().stream().map(Mark::text).toList();
        assertThat(texts).contains("B1", "G1", "C1").doesNotHaveDuplicates();
        assertThat(s.marks()).allSatisfy(m -> assertThat(m.text()).isEqualTo(m.prefix() + m.seq()));
        for (String prefix : List.of("B", "GB", "G", "C")) {
            List<Integer> seqs = s.marks().stream().filter(m -> m.prefix().equals(prefix)).map(Mark::seq).sorted().toList();
            for (int i = 0; i < seqs.size(); i++) assertThat(seqs.get(i)).isEqualTo(i + 1);
        }
    }

    @Test
    void aOneBayEditSplitsOnlyWhatChangedAndTheSplitNamesItsOrigin() {
        Stored before = Stored.after(building(), Stored.none());
        Derived edited = building(1, 0);
        Stored after = Stored.after(edited, before);
        List<String> moved = new ArrayList<>();
        for (var m : edited.members())
            if (!after.textOf().get(m.id()).equals(before.textOf().get(m.id()))) moved.add(m.id());
        assertThat(moved).as("the members of the edited bay, and those it loads").isNotEmpty().hasSizeLessThan(edited.members().size());
        // the edited bay's two infill beams leave B1 for a new mark that names B1 as its origin
        long b1 = before.marks().stream().filter(m -> m.text().equals("B1")).findFirst().orElseThrow().id();
        Mark split = after.marks().stream().filter(m -> m.prefix().equals("B") && m.seq() == 2).findFirst().orElseThrow();
        assertThat(split.originId()).isEqualTo(b1);
        assertThat(after.carried().values().stream().filter(v -> v == split.id()).count()).isEqualTo(2);
        for (var m : edited.members())
            if (!moved.contains(m.id())) assertThat(after.textOf().get(m.id())).isEqualTo(before.textOf().get(m.id()));
    }

    @Test
    void marksNeverRenumberAndAFreedNumberIsNotGivenAgain() {
        Stored first = Stored.after(building(), Stored.none());
        Stored split = Stored.after(building(1, 0), first);
        Stored back = Stored.after(building(), split);
        // undoing the edit: the beams find B1 again by their calculation; B2 is retired, not reused
        for (var m : building().members()) assertThat(back.textOf().get(m.id())).isEqualTo(first.textOf().get(m.id()));
        Mark b2 = back.marks().stream().filter(m -> m.text().equals("B2")).findFirst().orElseThrow();
        assertThat(b2.active()).isFalse();
        Stored again = Stored.after(building(35.0, 2, 1), back);
        assertThat(again.marks().stream().filter(m -> m.prefix().equals("B")).map(Mark::text))
                .as("a new split takes the next free number, never a retired one").contains("B3");
        assertThat(again.marks().stream().filter(m -> m.text().equals("B2")).findFirst().orElseThrow().active()).isFalse();
        // a split whose calculation is a retired mark's gets that mark back, under its old id
        Stored revived = Stored.after(building(2, 1), back);
        assertThat(revived.marks().stream().filter(m -> m.text().equals("B2")).findFirst().orElseThrow())
                .satisfies(m -> assertThat(m.active()).isTrue()).extracting(Mark::id).isEqualTo(b2.id());
    }

    @Test
    void anEditUndoneBringsTheSplitOffMembersBackEvenWhenTheyWereTheLargerPart() {
        Stored first = Stored.after(building(), Stored.none());
        // six of the eight bays heavier: the changed part is the larger one, and takes a new mark all the same
        Stored most = Stored.after(building(0, 0, 0, 1, 1, 0, 1, 1, 2, 0, 2, 1), first);
        var beams = building().members().stream().filter(m -> m.role() == MemberRole.INFILL_BEAM).toList();
        assertThat(beams).filteredOn(m -> m.bays().get(0).contains("4-5")).allSatisfy(m -> assertThat(most.textOf().get(m.id())).isEqualTo("B1"));
        assertThat(beams).filteredOn(m -> !m.bays().get(0).contains("4-5")).allSatisfy(m -> assertThat(most.textOf().get(m.id())).isEqualTo("B2"));
        Stored back = Stored.after(building(), most);
        for (var m : beams) assertThat(back.textOf().get(m.id())).isEqualTo("B1");
    }

    @Test
    void aChangeToEveryMemberOfAGroupKeepsItsMark() {
        Stored first = Stored.after(building(), Stored.none());
        Stored heavier = Stored.after(building(0, 0, 0, 1, 1, 0, 1, 1, 2, 0, 2, 1, 3, 0, 3, 1), first);
        var beams = building().members().stream().filter(m -> m.role() == MemberRole.INFILL_BEAM).toList();
        for (var m : beams) assertThat(heavier.textOf().get(m.id())).isEqualTo("B1");
    }

    @Test
    void aRenamedMarksTextIsPassedOverByTheNumbering() {
        Stored first = Stored.after(building(), Stored.none());
        List<Mark> renamed = first.marks().stream().map(m -> m.text().equals("G1") ? m.renamed("B2") : m).toList();
        Stored split = Stored.after(building(1, 0), new Stored(renamed, first.carried(), first.textOf()));
        assertThat(split.marks().stream().map(Mark::text)).contains("B3").doesNotHaveDuplicates();
    }

    @Test
    void aMarksTextIsRefusedNamingTheFieldWhenASheetCannotPrintIt() {
        for (String bad : new String[]{"", " ", "B 1", "a-very-long-mark", "<b>"})
            assertThatThrownBy(() -> Mark.checkedText(bad)).isInstanceOf(com.baysheet.engine.InputError.class).hasMessageContaining("mark");
        assertThat(Mark.checkedText(" B1A ")).isEqualTo("B1A");
    }
}
