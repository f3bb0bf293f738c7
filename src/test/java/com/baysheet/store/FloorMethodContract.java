package com.baysheet.store;

import com.baysheet.project.StoredLevel;
import com.baysheet.project.Project;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.Cell;
import com.baysheet.project.BayAssignment;
import com.baysheet.engine.InputError;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import org.junit.jupiter.api.Test;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** A project's choice of floor reduction method in the store, on each database. Run by every {@link StoreContract}. */
interface FloorMethodContract {
    Store store();

    /** Two office floors on the starting grid (30 ft bays), every bay framed. */
    private Project twoFloors() {
        Store s = store();
        Project p = s.projects().create(Editor.DEMO, StoreContract.info("FM-1"));
        long v = p.version();
        for (String[] l : new String[][] {{"Level 2", "12"}, {"Level 3", "24"}}) {
            StoredLevel level = s.levels().add(Editor.DEMO, p.id(), v++, new LevelInfo(l[0], Double.parseDouble(l[1]), false, Double.NaN));
            s.bays().assign(Editor.DEMO, p.id(), v++, level.id(), new BayAssignment(List.of(new Cell(0, 0), new Cell(1, 0), new Cell(0, 1),
                    new Cell(1, 1)), false, "office", 60, new Framing(Direction.Y, 2), Map.of()));
        }
        return s.projects().find(p.id());
    }

    /** Every member's record and every take-down's record as JSON text, by id. */
    private Map<String, String> records(long project) {
        var c = store().results().of(project);
        Map<String, String> out = new LinkedHashMap<>();
        c.derived().members().forEach(m -> out.put(m.id(), RecordJson.write(m.result().record())));
        c.derived().takeDowns().forEach(t -> out.put("takedown " + t.id(), RecordJson.write(t.record())));
        return out;
    }

    @Test
    default void aProjectSwitchesMethodAndBackWithItsRecordsUnchangedByteForByte() {
        Project p = twoFloors();
        assertThat(p.info().floorMethod()).isNull();
        Map<String, String> before = records(p.id());
        Project ibc = store().projects().update(Editor.DEMO, p.id(), p.version(), p.info().withFloorMethod("ibc-2021-alternative"));
        assertThat(store().projects().find(p.id()).info().floorMethod()).isEqualTo("ibc-2021-alternative");
        Map<String, String> during = records(p.id());
        assertThat(during.keySet()).isEqualTo(before.keySet());
        assertThat(during).isNotEqualTo(before);
        assertThat(during.values()).anyMatch(r -> r.contains("IBC 2021 alternative uniform live load reduction"));
        // the take-down works the chosen method's factor, not the edition's K_LL and influence area
        String takeDown = during.entrySet().stream().filter(e -> e.getKey().startsWith("takedown ")).findFirst().orElseThrow().getValue();
        assertThat(takeDown).contains("IBC 2021").doesNotContain("K_LL@");
        assertThat(before.entrySet().stream().filter(e -> e.getKey().startsWith("takedown ")).findFirst().orElseThrow().getValue()).contains("K_LL@");
        store().projects().update(Editor.DEMO, p.id(), ibc.version(), ibc.info().withFloorMethod(null));
        assertThat(records(p.id())).isEqualTo(before);
    }

    @Test
    default void aMethodNotWrittenForTheProjectsUnitsIsRefusedAndNothingIsStored() {
        Project p = twoFloors();
        assertThatThrownBy(() -> store().projects().update(Editor.DEMO, p.id(), p.version(), p.info().withFloorMethod("nbc-2020")))
                .isInstanceOf(InputError.class).hasMessageContaining("floorMethod");
        Project after = store().projects().find(p.id());
        assertThat(after.version()).isEqualTo(p.version());
        assertThat(after.info().floorMethod()).isNull();
    }

    @Test
    default void membersCarryTheOtherMethodsBesideTheProjectsOwn() {
        Project p = twoFloors();
        var member = store().results().of(p.id()).derived().members().stream().filter(m -> !m.result().methods().isEmpty()).findFirst().orElseThrow();
        var rows = member.result().methods();
        assertThat(rows.get(0).own()).isTrue();
        assertThat(rows.get(0).id()).isEmpty();
        assertThat(rows).extracting(r -> r.id()).contains("ibc-2021-alternative").doesNotContain("nbc-2020");
        // the project's own row reduces exactly as the member's record does: its live load is the record's L
        assertThat(rows.get(0).factor()).isEqualTo(member.result().floorReduction().orElseThrow().factor());
    }
}
