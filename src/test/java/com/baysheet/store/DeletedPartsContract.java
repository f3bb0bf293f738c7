package com.baysheet.store;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.LineLoadEntry;
import com.baysheet.project.Project;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Parts of a level deleted and kept on each database (the kinds V123 admits): cleared bays and a deleted line load come
 * back with the same members and records.
 */
interface DeletedPartsContract {
    Store store();

    private static long v(Store s, Project p) { return s.projects().find(p.id()).version(); }

    private static Map<String, String> records(Store s, Project p) {
        var d = s.results().of(p.id()).derived();
        Map<String, String> out = new TreeMap<>();
        for (DerivedMember m : d.members()) out.put(m.id(), RecordJson.write(m.result().record()) + " | " + m.name());
        for (TakeDown t : d.takeDowns()) out.put("takedown " + t.id(), RecordJson.write(t.record()));
        return out;
    }

    @Test
    default void clearedBaysAndADeletedLineLoadComeBackWithTheSameRecords() {
        Store s = store();
        Project p = s.projects().create(Editor.DEMO, StoreContract.info("DP-1"));
        long level = s.levels().add(Editor.DEMO, p.id(), v(s, p), new LevelInfo("Level 2", 12, false, Double.NaN)).id();
        s.bays().assign(Editor.DEMO, p.id(), v(s, p), level, new BayAssignment(List.of(new Cell(0, 0), new Cell(1, 0), new Cell(0, 1),
                new Cell(1, 1)), false, "office", 60, new Framing(Direction.Y, 2), Map.of()));
        long wall = s.lineLoads().add(Editor.DEMO, p.id(), v(s, p), level,
                new LineLoadEntry(null, "1", "A", "B", "West wall", 400, Double.NaN, Double.NaN, 0, null, false)).id();
        Map<String, String> before = records(s, p);

        s.lineLoads().delete(Editor.DEMO, p.id(), v(s, p), level, wall);
        s.bays().clear(Editor.DEMO, p.id(), v(s, p), level, List.of(new Cell(1, 0), new Cell(1, 1)));
        List<DeletedItem> kept = s.deleted().list().stream().filter(i -> i.projectId() == p.id()).toList();
        assertThat(kept).extracting(DeletedItem::kind).containsExactly(DeletedItem.BAYS, DeletedItem.LINE_LOAD);
        // oldest first, as someone undoing the two would
        for (int k = kept.size() - 1; k >= 0; k--) s.deleted().restore(Editor.DEMO, kept.get(k).id());
        assertThat(records(s, p)).isEqualTo(before);
    }
}
