package com.baysheet.store;

import com.baysheet.project.StoredLevel;
import com.baysheet.project.Project;
import com.baysheet.engine.InputError;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * A project's model as one JSON file, on each database: an exported project imports as one with the same members and
 * the same records byte for byte (ids aside, which follow the new rows), exports again to the same file, and a file
 * with a bad value is refused naming where it is, with nothing stored.
 */
interface ModelFileContract {
    Store store();

    /** The demo's office block with Level 3 made the same as Level 2, so the file carries a typical link. */
    private Project demo() {
        Project p = Demo.loadIfEmpty(store()).get(0);
        long l2 = id(p, "Level 2"), l3 = id(p, "Level 3");
        store().typicals().link(Editor.DEMO, p.id(), store().projects().find(p.id()).version(), l2, List.of(l3));
        // a girder of Level 2 with its own weight, so the file carries a weight entered for one member
        DerivedMember g = store().results().of(p.id()).derived().members().stream()
                .filter(m -> m.level().equals("Level 2") && m.role() == com.baysheet.framing.MemberRole.GIRDER).findFirst().orElseThrow();
        store().selfWeights().setMember(Editor.DEMO, p.id(), store().projects().find(p.id()).version(), g.id(), g.name(), 120);
        return store().projects().find(p.id());
    }

    private long id(Project p, String level) {
        return store().levels().findByProject(p.id()).stream().filter(l -> l.name().equals(level)).findFirst().orElseThrow().id();
    }

    /** Every member's and take-down's record as JSON text, keyed by id with the level's row key replaced by its name. */
    private Map<String, String> records(Project p) {
        Map<String, String> keys = new TreeMap<>();
        for (StoredLevel l : store().levels().findByProject(p.id())) keys.put("L" + l.id() + "-", l.name() + "-");
        var derived = store().results().of(p.id()).derived();
        Map<String, String> out = new TreeMap<>();
        for (DerivedMember m : derived.members())
            out.put(renamed(m.id(), keys), renamed(RecordJson.write(m.result().record()), keys) + " | " + m.name() + " " + m.areas());
        for (TakeDown t : derived.takeDowns()) out.put("takedown " + renamed(t.id(), keys), renamed(RecordJson.write(t.record()), keys));
        return out;
    }

    private static String renamed(String text, Map<String, String> keys) {
        String out = text;
        for (var k : keys.entrySet()) out = out.replace(k.getKey(), k.getValue());
        return out;
    }

    @Test
    default void anExportedProjectImportsWithTheSameMembersAndRecordsByteForByte() {
        Project p = demo();
        ObjectNode file = store().exports().of(p.id());
        assertThat(file.path("levels").get(2).path("sameAs").asText()).isEqualTo("Level 2");
        assertThat(file.path("levels").get(1).path("memberWeights").get(0).path("weight").asDouble()).isEqualTo(120.0);
        Project copy = store().imports().create(Editor.DEMO, file, "24-031-B");
        assertThat(copy.info().jobNumber()).isEqualTo("24-031-B");
        assertThat(copy.info().snow()).isEqualTo(p.info().snow());
        Map<String, String> before = records(p);
        assertThat(before).hasSizeGreaterThan(50);
        Map<String, String> after = records(copy);
        assertThat(after.keySet()).isEqualTo(before.keySet());
        assertThat(after).isEqualTo(before);
        assertThat(store().levels().find(copy.id(), id(copy, "Level 3")).typicalOf()).isEqualTo(id(copy, "Level 2"));

        ObjectNode again = store().exports().of(copy.id());
        ((ObjectNode) again.get("project")).put("jobNumber", p.info().jobNumber());
        assertThat(RecordJson.write(again)).isEqualTo(RecordJson.write(file));
    }

    @Test
    default void aCopiedJobHasTheSameMembersAndRecordsAndATakenJobNumberStoresNothing() {
        Project p = demo();
        Project copy = store().imports().copy(Editor.DEMO, p.id(), "24-031-C", "Alder Street phase 2");
        assertThat(copy.info().jobNumber()).isEqualTo("24-031-C");
        assertThat(copy.info().name()).isEqualTo("Alder Street phase 2");
        assertThat(copy.archived()).isFalse();
        assertThat(records(copy)).hasSizeGreaterThan(50).isEqualTo(records(p));
        ObjectNode again = store().exports().of(copy.id());
        ((ObjectNode) again.get("project")).put("jobNumber", p.info().jobNumber()).put("name", p.info().name());
        assertThat(RecordJson.write(again)).isEqualTo(RecordJson.write(store().exports().of(p.id())));

        int before = store().projects().findAll().size();
        assertThatThrownBy(() -> store().imports().copy(Editor.DEMO, p.id(), p.info().jobNumber(), ""))
                .isInstanceOfSatisfying(Duplicate.class, e -> assertThat(e.field()).isEqualTo("jobNumber"));
        assertThatThrownBy(() -> store().imports().copy(Editor.DEMO, p.id(), " ", ""))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.field()).isEqualTo("jobNumber"));
        assertThat(store().projects().findAll()).hasSize(before);
    }

    @Test
    default void anArchivedProjectRefusesModelChangesUntilUnArchived() {
        Project p = demo();
        Project archived = store().projects().archive(Editor.DEMO, p.id(), p.version(), true);
        assertThat(archived.archived()).isTrue();
        assertThat(archived.version()).isEqualTo(p.version() + 1);
        assertThat(store().projects().findAll(false)).extracting(Project::id).doesNotContain(p.id());
        assertThat(store().projects().findAll(true)).extracting(Project::id).containsExactly(p.id());
        assertThatThrownBy(() -> store().projects().update(Editor.DEMO, p.id(), archived.version(), p.info()))
                .isInstanceOf(Archived.class).hasMessageContaining("is archived");
        assertThatThrownBy(() -> store().projects().delete(Editor.DEMO, p.id(), archived.version())).isInstanceOf(Archived.class);
        assertThat(store().projects().find(p.id()).version()).isEqualTo(archived.version());
        Project back = store().projects().archive(Editor.DEMO, p.id(), archived.version(), false);
        assertThat(back.archived()).isFalse();
        assertThat(store().projects().findAll(false)).extracting(Project::id).contains(p.id());
        assertThat(store().projects().update(Editor.DEMO, p.id(), back.version(), p.info()).version()).isEqualTo(back.version() + 1);
    }

    @Test
    default void convertingUsToSiAndBackReturnsTheModelWithinOnePartInABillion() {
        Project p = demo();
        ObjectNode us = store().exports().of(p.id());
        Project si = store().conversions().convert(Editor.DEMO, p.id(), p.version(), com.baysheet.engine.units.UnitSystem.SI);
        assertThat(si.info().units()).isEqualTo(com.baysheet.engine.units.UnitSystem.SI);
        ObjectNode metric = store().exports().of(p.id());
        // 30 ft = 9.144 m exactly; 14 ft = 4.2672 m (NIST SP 811)
        assertThat(metric.at("/grid/x/spacings/0").asDouble()).isCloseTo(9.144, org.assertj.core.api.Assertions.within(1e-12));
        assertThat(metric.at("/levels/1/elevation").asDouble()).isCloseTo(4.2672, org.assertj.core.api.Assertions.within(1e-12));
        // 120 plf = 120 × 4.4482216152605 N / 0.3048 m = 1.751268352 kN/m (NIST SP 811)
        assertThat(metric.at("/levels/1/memberWeights/0/weight").asDouble()).isCloseTo(1.751268352, org.assertj.core.api.Assertions.within(1e-9));
        assertThat(store().results().of(p.id()).derived().members()).isNotEmpty();
        store().conversions().convert(Editor.DEMO, p.id(), si.version(), com.baysheet.engine.units.UnitSystem.US);
        sameWithin(us, store().exports().of(p.id()), "", 1e-9);
        assertThatThrownBy(() -> store().conversions().convert(Editor.DEMO, p.id(), si.version() + 1, com.baysheet.engine.units.UnitSystem.US))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.field()).isEqualTo("units"));
    }

    /** Two JSON trees alike in shape and text, every number within {@code relative} of the other. */
    private static void sameWithin(JsonNode a, JsonNode b, String at, double relative) {
        if (a.isNumber()) {
            assertThat(b.isNumber()).as(at).isTrue();
            assertThat(b.asDouble()).as(at).isCloseTo(a.asDouble(), org.assertj.core.api.Assertions.within(relative * Math.abs(a.asDouble())));
            return;
        }
        assertThat(b.getNodeType()).as(at).isEqualTo(a.getNodeType());
        assertThat(b.size()).as(at).isEqualTo(a.size());
        if (a.isArray()) for (int i = 0; i < a.size(); i++) sameWithin(a.get(i), b.get(i), at + "/" + i, relative);
        else if (a.isObject()) a.fieldNames().forEachRemaining(f -> sameWithin(a.get(f), b.get(f), at + "/" + f, relative));
        else assertThat(b).as(at).isEqualTo(a);
    }

    @Test
    default void aFileWithABadValueIsRefusedNamingWhereAndNothingIsStored() {
        Project p = demo();
        ObjectNode file = store().exports().of(p.id());
        ((ObjectNode) file.path("levels").get(1).path("bays").get(0)).put("occupancy", "no-such-use");
        int projects = store().projects().findAll().size();
        assertThatThrownBy(() -> store().imports().create(Editor.DEMO, file, "24-031-C"))
                .isInstanceOfSatisfying(InputError.class, e -> assertThat(e.field()).isEqualTo("levels[Level 2].bays[0].occupancy"));
        assertThat(store().projects().findAll()).hasSize(projects);

        ObjectNode same = store().exports().of(p.id());
        assertThatThrownBy(() -> store().imports().create(Editor.DEMO, same, ""))
                .isInstanceOfSatisfying(Duplicate.class, e -> assertThat(e.field()).isEqualTo("jobNumber"));
        JsonNode notAModel = RecordJson.mapper().createArrayNode();
        assertThatThrownBy(() -> store().imports().create(Editor.DEMO, notAModel, "X-1")).isInstanceOf(InputError.class);
        assertThat(store().projects().findAll()).hasSize(projects);
    }
}
