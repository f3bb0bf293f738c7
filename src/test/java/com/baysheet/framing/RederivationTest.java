package com.baysheet.framing;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Named cases of deriving a building again after an edit: what is reused, and that the result is the full derivation's. */
class RederivationTest {
    static final Framing F = new Framing(Direction.X, 1);

    /** Four office floors, the middle two linked to one typical (the store gives them the typical's bays), and a roof. */
    static Building typicalFloors(double dead) {
        Grid g = Buildings.grid(new double[] {30, 25, 30}, new double[] {28, 28});
        List<Bay> typical = Buildings.everyBay(g, (c, r) -> Bay.floor(c, r, "office", c == 1 && r == 0 ? dead : 60, F));
        List<Level> levels = List.of(
                Level.floor("F1", 12, Buildings.everyBay(g, (c, r) -> Bay.floor(c, r, "retail-first", 60, F))).withKey("L1"),
                Level.floor("F2", 24, typical).withKey("L2"),
                Level.floor("F3", 36, typical).withKey("L3"),
                Level.roof("R", 48, 0.25, Buildings.everyBay(g, (c, r) -> Bay.floor(c, r, "roof-ordinary", 20, F))).withKey("L4"));
        return new Building("typical", Buildings.US, g, levels);
    }

    @Test
    void anEditOnATypicalLevelFramesTheLevelsLinkedToItAndReusesTheOthers() {
        Rederivation again = new Rederivation();
        Derived before = again.derive(typicalFloors(60));
        Building edited = typicalFloors(85);
        Derived after = again.derive(edited);
        Rederivations.assertSame(after, Rederivations.full(edited), "typical edited");
        assertThat(Rederivations.reusedLevels(before, after)).containsExactlyInAnyOrder("R", "F1");
        // the columns below the edited levels carry the change down to the foot
        assertThat(after.takeDowns().get(0).rows()).isEqualTo(before.takeDowns().get(0).rows());
    }

    @Test
    void aLevelFramedAgainKeepsEachMemberTheEditLeftAsItWasAsTheSameObject() {
        Rederivation again = new Rederivation();
        Derived before = again.derive(typicalFloors(60));
        Building edited = typicalFloors(85);
        Derived after = again.derive(edited);
        Rederivations.assertSame(after, Rederivations.full(edited), "typical edited");
        // F2 is framed again: the beam of a bay away from the edited one comes out as it was, the edited bay's does not
        String away = "L2-bay0x1-b1", edit = "L2-bay1x0-b1";
        assertThat(after.member(away).orElseThrow()).isSameAs(before.member(away).orElseThrow());
        assertThat(after.member(edit).orElseThrow()).isNotSameAs(before.member(edit).orElseThrow());
        assertThat(after.member(edit).orElseThrow().result().record()).isNotEqualTo(before.member(edit).orElseThrow().result().record());
        assertThat(Rederivations.reusedLevels(before, after)).doesNotContain("F2");
    }

    @Test
    void derivingTheSameBuildingAgainGivesTheSameResult() {
        Rederivation again = new Rederivation();
        Derived before = again.derive(typicalFloors(60));
        assertThat(again.derive(typicalFloors(60))).isSameAs(before);
    }

    /** A low roof beside a higher one in a snow project: the low roof's drift reads the higher roof's elevation and bays. */
    static Building steppedRoofs(double highElevation, boolean highCoversBoth) {
        Grid g = Buildings.grid(new double[] {30, 30, 30}, new double[] {30});
        Level low = Level.roof("Low roof", 12, 0.25, List.of(Bay.floor(0, 0, "roof-ordinary", 20, F), Bay.floor(1, 0, "roof-ordinary", 20, F),
                Bay.floor(2, 0, "roof-ordinary", 20, F))).withKey("L1");
        List<Bay> high = new ArrayList<>(List.of(Bay.floor(2, 0, "roof-ordinary", 20, F)));
        if (highCoversBoth) high.add(Bay.floor(1, 0, "roof-ordinary", 20, F));
        Level top = Level.roof("High roof", highElevation, 0.25, high).withKey("L2");
        return SnowTakeDownProperties.building(g, List.of(low, top), 30);
    }

    @Test
    void anEditOnALevelAboveARoofStepFramesTheLowerRoofAgain() {
        for (Building edited : List.of(steppedRoofs(30, false), steppedRoofs(24, true))) {
            Rederivation again = new Rederivation();
            Derived before = again.derive(steppedRoofs(24, false));
            Derived after = again.derive(edited);
            Rederivations.assertSame(after, Rederivations.full(edited), "high roof edited");
            assertThat(Rederivations.reusedLevels(before, after)).isEmpty();
        }
    }

    @Test
    void anEditOnTheLowerRoofLeavesTheHigherOneAsItWas() {
        Rederivation again = new Rederivation();
        Derived before = again.derive(steppedRoofs(24, false));
        Building b = steppedRoofs(24, false);
        Level low = b.levels().get(0);
        List<Bay> bays = new ArrayList<>(low.bays());
        bays.set(0, Bay.floor(0, 0, "roof-ordinary", 35, F));
        Building edited = RederivationProperties.withLevel(b, low, new Level(low.name(), low.elevation(), true, 0.25, bays, low.key(), low.surface()));
        Derived after = again.derive(edited);
        Rederivations.assertSame(after, Rederivations.full(edited), "low roof edited");
        assertThat(Rederivations.reusedLevels(before, after)).containsExactly("High roof");
    }

    @Test
    void aGridChangeDerivesTheWholeBuilding() {
        Rederivation again = new Rederivation();
        Building b = typicalFloors(60);
        Derived before = again.derive(b);
        GridAxis x = b.grid().x();
        Grid wider = new Grid(new GridAxis("x", x.names(), List.of(30.0, 26.0, 30.0), x.ids()), b.grid().y());
        Building edited = new Building(b.name(), b.context(), wider, b.levels(), b.selfWeights(), b.lineLoads(), b.pointLoads());
        Derived after = again.derive(edited);
        Rederivations.assertSame(after, Rederivations.full(edited), "grid edited");
        assertThat(Rederivations.reusedLevels(before, after)).isEmpty();
    }

    @Test
    void aRefusedEditIsRefusedAsTheFullDerivationRefusesIt() {
        Rederivation again = new Rederivation();
        again.derive(typicalFloors(60));
        Building b = typicalFloors(60);
        Building refused = b.withPointLoads(List.of(com.baysheet.framing.model.GridPointLoad.inBay("F2", "unit", 7, 0, 1, 1, 500, 0, "office")));
        Rederivations.assertSame(Rederivations.Outcome.of(() -> again.derive(refused)), Rederivations.Outcome.of(() -> Rederivations.full(refused)),
                "refused");
        assertThat(Rederivations.Outcome.of(() -> again.derive(refused)).refused()).isNotNull();
    }

    @Test
    void itRemembersABoundedNumberOfBuildings() {
        Rederivation again = new Rederivation();
        for (int k = 0; k < Rederivation.BUILDINGS + 5; k++) {
            Building b = typicalFloors(60);
            String project = "P" + k;
            again.derive(new Building(b.name(), b.context(), b.grid(), b.levels().stream().map(l -> l.withKey(project + l.key())).toList()));
        }
        assertThat(again.remembered()).isEqualTo(Rederivation.BUILDINGS);
    }

    /** The store reads a firm's catalogue afresh on every load: an equal catalogue is the same setting, another row is not. */
    @Test
    void aCatalogueReadAgainIsTheSameSettingAndAnotherRowDerivesTheWholeBuilding() {
        java.util.function.DoubleFunction<Building> withFirmRow = psf -> {
            Building b = typicalFloors(60);
            var cat = b.context().catalogue().with(com.baysheet.engine.code.OccupancyCatalogue.custom("firm-lab", "Laboratory",
                    com.baysheet.engine.units.UnitSystem.US, psf, 0, 30, com.baysheet.engine.code.ReductionRule.ORDINARY, false));
            return new Building(b.name(), b.context().withCatalogue(cat), b.grid(), b.levels());
        };
        Rederivation again = new Rederivation();
        Derived before = again.derive(withFirmRow.apply(100));
        Building readAgain = withFirmRow.apply(100), edited = RederivationProperties.withBay(readAgain, readAgain.levels().get(0),
                readAgain.levels().get(0).bays().get(0), Bay.floor(0, 0, "retail-first", 75, F));
        Derived after = again.derive(edited);
        Rederivations.assertSame(after, Rederivations.full(edited), "catalogue read again");
        assertThat(Rederivations.reusedLevels(before, after)).containsExactlyInAnyOrder("F2", "F3", "R");

        Building otherRow = withFirmRow.apply(125);
        Derived changed = again.derive(otherRow);
        Rederivations.assertSame(changed, Rederivations.full(otherRow), "another catalogue");
        assertThat(Rederivations.reusedLevels(after, changed)).isEmpty();
    }

    /** Two floors, no roof: F1 is open to the sky where F2 has no bay over it, and says so on its records. */
    static Building terrace(boolean f2CoversAll) {
        Grid g = Buildings.grid(new double[] {30, 30}, new double[] {28});
        List<Bay> upper = new ArrayList<>(List.of(Bay.floor(0, 0, "office", 60, F)));
        if (f2CoversAll) upper.add(Bay.floor(1, 0, "office", 60, F));
        return new Building("terrace", Buildings.US, g, List.of(
                Level.floor("F1", 12, Buildings.everyBay(g, (c, r) -> Bay.floor(c, r, "office", 60, F))).withKey("L1"),
                Level.floor("F2", 24, upper).withKey("L2")));
    }

    @Test
    void anEditAboveAFloorChangesWhichOfItsBaysAreOpenToTheSky() {
        // F1 reads F2's bays: covering its east bay takes the open-to-sky caution off F1's members there
        Rederivation again = new Rederivation();
        again.derive(terrace(false));
        Building covered = terrace(true);
        Rederivations.assertSame(again.derive(covered), Rederivations.full(covered), "east bay of F2 added");
        Building open = terrace(false);
        Rederivations.assertSame(again.derive(open), Rederivations.full(open), "east bay of F2 removed again");
    }
}
