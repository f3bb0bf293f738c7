package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A floor level's bays that no higher level covers are open to the sky, yet as a floor they carry no roof live load
 * and no snow: every beam, girder and column carrying them, and the column take-downs, say so in a CAUTION naming
 * the bays (the exposure test of the roof steps, ASCE 7-16 7.7.1; occupiable roofs 4.8.3).
 */
class OpenToSkyTest {
    static final Framing F = new Framing(Direction.X, 1);
    static final Grid G = Buildings.grid(new double[] {30, 30}, new double[] {30});

    static List<String> open(CalcRecord r) {
        return r.notes().stream().filter(n -> n.level() == Note.Level.CAUTION && n.text().startsWith("Open to the sky"))
                .map(Note::text).toList();
    }

    static List<DerivedMember> on(Derived d, String level) {
        return d.members().stream().filter(m -> m.level().equals(level)).toList();
    }

    @Test
    void theTopLevelOfABuildingThatIsAFloorCarriesTheCautionAndTheFloorBelowItDoesNot() {
        // two office floors, the top one not marked as a roof: snow site p_g = 30 psf
        Building b = SnowTakeDownProperties.building(G, Buildings.floors(G, 2, "office", 60, F), 30);
        Derived d = Derivation.derive(b);
        for (DerivedMember m : on(d, "F2").stream().filter(m -> m.role() != MemberRole.COLUMN).toList())
            assertThat(open(m.result().record())).as(m.name()).singleElement().asString()
                    .contains("this member carries floor bays that no higher level covers (every bay of F2)")
                    .contains("no roof live load and no snow is applied there").contains("occupiable roof (ASCE 7-16 4.8.3)")
                    .contains("roof rows of ASCE 7-16 Table 4.3-1");
        // F1 is covered by F2: no such caution on its beams and girders
        assertThat(on(d, "F1")).filteredOn(m -> m.role() != MemberRole.COLUMN).isNotEmpty()
                .allSatisfy(m -> assertThat(open(m.result().record())).as(m.name()).isEmpty());
        // the columns below F2 and F1 carry F2's open bays, and so do the take-downs
        assertThat(d.members()).filteredOn(m -> m.role() == MemberRole.COLUMN).hasSize(12).allSatisfy(m ->
                assertThat(open(m.result().record())).singleElement().asString().contains("this column carries floor bays")
                        .contains("(every bay of F2)"));
        assertThat(d.takeDowns()).hasSize(6).allSatisfy(t -> assertThat(open(t.record())).singleElement().asString().contains("every bay of F2"));
    }

    @Test
    void theCautionNamesTheLevelsBaysSoIdenticalMembersStayOneTypicalMark() {
        // F2's beams carry the caution and F1's do not, yet each level's identical members are one mark as before:
        // the two bays' infill beams alike, the two edge girders alike
        Derived d = Derivation.derive(SnowTakeDownProperties.building(G, Buildings.floors(G, 2, "office", 60, F), 30));
        for (String level : List.of("F1", "F2"))
            assertThat(Typicals.of(d)).filteredOn(t -> t.members().get(0).level().equals(level) && t.role() == MemberRole.INFILL_BEAM)
                    .as(level).singleElement().satisfies(t -> assertThat(t.members()).hasSize(2));
    }

    @Test
    void aTerraceLeftOpenByTheLevelAboveIsNamedAndTheCoveredBayIsNot() {
        // F1 has both bays; the roof above covers only the west one: F1's east bay is a terrace open to the sky
        Level f1 = Level.floor("F1", 12, List.of(Bay.floor(0, 0, "office", 60, F), Bay.floor(1, 0, "office", 60, F)));
        Level roof = Level.roof("R", 24, 0.25, List.of(Bay.floor(0, 0, "roof-ordinary", 20, F)));
        Derived d = Derivation.derive(SnowTakeDownProperties.building(G, List.of(f1, roof), 30));
        String west = G.bayName(0, 0), east = G.bayName(1, 0);
        assertThat(open(RoofDriftTest.member(d, "Beam " + east + " #1", "F1").result().record())).singleElement().asString()
                .contains("(bay " + east + " of F1)");
        assertThat(open(RoofDriftTest.member(d, "Beam " + west + " #1", "F1").result().record())).isEmpty();
        // the girder between them carries the terrace's beams: it names the east bay only; the west edge girder nothing
        assertThat(open(RoofDriftTest.member(d, "Girder 2/Y1-Y2", "F1").result().record())).singleElement().asString()
                .contains("(bay " + east + " of F1)").doesNotContain(west);
        assertThat(open(RoofDriftTest.member(d, "Girder 1/Y1-Y2", "F1").result().record())).isEmpty();
        // the roof's own members carry no such caution (a roof is loaded as a roof)
        assertThat(on(d, "R")).allSatisfy(m -> assertThat(open(m.result().record())).isEmpty());
    }

    @Test
    void withoutASnowSiteTheCautionIsForTheRoofLiveLoadOnly() {
        Derived d = Derivation.derive(Buildings.building(G, Buildings.floors(G, 1, "office", 60, F)));
        assertThat(on(d, "F1")).allSatisfy(m -> assertThat(open(m.result().record())).singleElement().asString()
                .contains("no roof live load is applied there").doesNotContain("snow"));
    }

    @Test
    void aBuildingWithARoofOverEveryFloorCarriesNoSuchCaution() {
        Derived d = Derivation.derive(SnowTakeDownProperties.building(G, SnowTakeDownProperties.roofOver(G, 2, F), 30));
        assertThat(d.members()).allSatisfy(m -> assertThat(open(m.result().record())).as(m.name()).isEmpty());
        assertThat(d.takeDowns()).allSatisfy(t -> assertThat(open(t.record())).isEmpty());
    }
}
