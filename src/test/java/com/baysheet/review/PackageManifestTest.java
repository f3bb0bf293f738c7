package com.baysheet.review;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
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
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class PackageManifestTest {
    /** Three bays by two, an office floor (of this dead load, psf) under a roof; infill beams span in x. */
    static Derived building(double floorDead) {
        Grid g = new Grid(new GridAxis("x", List.of("1", "2", "3", "4"), List.of(30.0, 30.0, 30.0)),
                new GridAxis("y", List.of("A", "B", "C"), List.of(25.0, 25.0)));
        List<Bay> floor = new ArrayList<>(), roof = new ArrayList<>();
        for (int c = 0; c < 3; c++)
            for (int r = 0; r < 2; r++) {
                floor.add(Bay.floor(c, r, "office", floorDead, new Framing(Direction.X, 2)));
                roof.add(Bay.floor(c, r, "roof-ordinary", 25, new Framing(Direction.X, 2)));
            }
        return Derivation.derive(new Building("Elm Street Offices", CalcContext.of(UnitSystem.US), g,
                List.of(Level.floor("Level 2", 14, floor), Level.roof("Roof", 28, 0.25, roof))));
    }

    /** The manifest under the marks a first model write gives the derivation. */
    static CalcRecord of(PackageScope scope, Derived d) {
        return PackageManifest.of(scope, d, MarkSheets.fresh(d));
    }

    @Test
    void listsEveryMarkWithTheFingerprintOfItsSheetThenTheTakeDowns() {
        Derived d = building(65);
        MarkSheets marks = MarkSheets.fresh(d);
        CalcRecord m = of(PackageScope.PROJECT, d);
        assertThat(m.subject()).isEqualTo("Project package");
        List<Entry> sheets = m.inputs().stream().filter(PackageManifest::isMember).toList();
        assertThat(sheets).hasSize(marks.all().size()).hasSizeLessThan(d.members().size());
        for (MarkSheets.MarkSheet x : marks.all()) {
            Entry e = sheets.stream().filter(i -> i.label().equals("Mark " + x.text())).findFirst().orElseThrow();
            assertThat(e.shown()).isEqualTo(CalcFingerprint.of(x.record()));
        }
        assertThat(m.inputs().stream().filter(e -> !PackageManifest.isMember(e)).count()).isEqualTo(d.takeDowns().size())
                .isPositive();
        assertThat(m.steps()).as("a manifest has no steps, so no markup can target one").isEmpty();
    }

    @Test
    void resultsAreEachMarksGoverningValues() {
        Derived d = building(65);
        CalcRecord m = of(PackageScope.ofLevel("Level 2"), d);
        List<MarkSheets.MarkSheet> marks = PackageScope.ofLevel("Level 2").marks(d, MarkSheets.fresh(d));
        MarkSheets.MarkSheet first = marks.get(0);
        CalcRecord r = first.record();
        assertThat(r.governing()).isNotEmpty();
        for (String key : r.governing()) {
            Entry e = m.entry(MarkSheets.PREFIX + "new-" + first.text() + "." + key);
            assertThat(e.value()).isEqualTo(r.entry(key).value());
            assertThat(e.label()).startsWith(first.text() + ": ");
        }
        assertThat(m.results()).hasSize(marks.stream().mapToInt(x -> x.record().governing().size()).sum());
    }

    @Test
    void aLevelsManifestHoldsOnlyThatLevelsMarksAndTheTakeDownsThroughIt() {
        Derived d = building(65);
        CalcRecord roof = of(PackageScope.ofLevel("Roof"), d);
        assertThat(roof.subject()).isEqualTo("Roof package");
        java.util.Set<String> onRoof = new java.util.HashSet<>(d.onLevel("Roof").stream().map(DerivedMember::id).toList());
        assertThat(roof.inputs().stream().filter(PackageManifest::isMember).count()).isEqualTo(MarkSheets.fresh(d).all().stream()
                .filter(s -> s.group().memberIds().stream().anyMatch(onRoof::contains)).count());
        assertThat(roof.inputs().stream().filter(e -> !PackageManifest.isMember(e)).count())
                .isEqualTo(d.takeDowns().stream().filter(t -> t.rows().stream().anyMatch(r -> r.level().equals("Roof"))).count());
    }

    @Test
    void theSameModelGivesTheSameManifestAndFingerprint() {
        assertThat(CalcFingerprint.of(of(PackageScope.PROJECT, building(65))))
                .isEqualTo(CalcFingerprint.of(of(PackageScope.PROJECT, building(65))));
    }

    @Test
    void aHeavierFloorChangesTheFloorsSheetsAndTheComparisonNamesThem() {
        CalcRecord before = of(PackageScope.ofLevel("Level 2"), building(65));
        CalcRecord after = of(PackageScope.ofLevel("Level 2"), building(80));
        assertThat(CalcFingerprint.of(after)).isNotEqualTo(CalcFingerprint.of(before));
        RevisionComparison c = RevisionComparison.of(before, after);
        Map<String, String> labels = after.inputs().stream().collect(Collectors.toMap(Entry::key, Entry::label));
        assertThat(c.inputs()).isNotEmpty().allSatisfy(ch -> {
            assertThat(ch.kind()).isEqualTo(RevisionComparison.Kind.CHANGED);
            assertThat(ch.label()).isEqualTo(labels.get(ch.key()));
            assertThat(ch.before()).isNotEqualTo(ch.after());
        });
        assertThat(c.results()).isNotEmpty();
    }

    @Test
    void aChangeBelowTheRoofLeavesTheRoofMembersAsTheyWere() {
        Function<Derived, List<Entry>> roofMembers = d -> of(PackageScope.ofLevel("Roof"), d).inputs()
                .stream().filter(PackageManifest::isMember).toList();
        assertThat(roofMembers.apply(building(80))).isEqualTo(roofMembers.apply(building(65)));
    }

    @Test
    void aLevelWithoutMembersHasNoManifest() {
        assertThatThrownBy(() -> of(PackageScope.ofLevel("Level 9"), building(65)))
                .isInstanceOf(InputError.class).hasMessageContaining("Level 9 package");
    }
}
