package com.baysheet.framing;

import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import org.junit.jupiter.api.Test;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;

/** The derivation as a whole: ids, names and records of the members it returns. */
class DerivationTest {
    private static final Grid GRID = Buildings.grid(new double[] {20, 20, 20}, new double[] {25, 25});

    @Test
    void identicalMembersShareACalculationButEachRecordNamesItsOwnMember() {
        Building b = Buildings.building(GRID, Buildings.floors(GRID, 3, "office", 60, new Framing(Direction.X, 2)));
        Derived d = Derivation.derive(b);
        Set<String> ids = new HashSet<>();
        for (DerivedMember m : d.members()) {
            assertThat(ids.add(m.id())).as("id %s given once", m.id()).isTrue();
            assertThat(m.id()).matches("[A-Za-z0-9-]+");
            assertThat(m.result().record().subject()).as(m.id()).startsWith(m.name());
        }
        List<DerivedMember> beams = d.members().stream().filter(m -> m.role() == MemberRole.INFILL_BEAM).toList();
        DerivedMember first = beams.get(0), last = beams.get(beams.size() - 1);
        assertThat(last.result().record().subject()).isNotEqualTo(first.result().record().subject());
        assertThat(last.result().record().results()).isEqualTo(first.result().record().results());
    }

    @Test
    void derivingTwiceGivesTheSameNumbers() {
        Building b = Buildings.random(42);
        Derived one = Derivation.derive(b), two = Derivation.derive(b);
        assertThat(two.members()).hasSameSizeAs(one.members());
        for (int k = 0; k < one.members().size(); k++)
            assertThat(two.members().get(k).result().record().results()).isEqualTo(one.members().get(k).result().record().results());
        for (int k = 0; k < one.takeDowns().size(); k++)
            assertThat(two.takeDowns().get(k).rows()).isEqualTo(one.takeDowns().get(k).rows());
    }

    @Test
    void membersAreFoundByIdAndByLevel() {
        Derived d = Derivation.derive(Buildings.building(GRID, Buildings.floors(GRID, 2, "office", 60, new Framing(Direction.Y, 1))));
        DerivedMember any = d.members().get(d.members().size() / 2);
        assertThat(d.member(any.id())).contains(any);
        assertThat(d.onLevel(any.level())).contains(any);
        assertThat(d.takeDowns()).hasSize(GRID.x().lines() * GRID.y().lines());
        assertThat(d.takeDown(d.takeDowns().get(0).id())).isPresent();
    }

    @Test
    void aGirderCarryingBeamsSaysItsAreaIncludesTheirsAndABeamDoesNot() {
        // docs/engine.md, girder tributary area: the beams' delivered areas count toward the girder's own K_LL·A_T
        Derived d = Derivation.derive(Buildings.building(GRID, Buildings.floors(GRID, 1, "office", 60, new Framing(Direction.X, 2))));
        String note = "delivered by the members this one carries";
        List<DerivedMember> girders = d.members().stream().filter(m -> m.role() == MemberRole.GIRDER).toList();
        assertThat(girders).isNotEmpty().allSatisfy(g -> assertThat(g.result().record().notes()).anyMatch(n -> n.text().contains(note)));
        DerivedMember beam = d.members().stream().filter(m -> m.role() == MemberRole.INFILL_BEAM).findFirst().orElseThrow();
        assertThat(beam.result().record().notes()).noneMatch(n -> n.text().contains(note));
    }
}
