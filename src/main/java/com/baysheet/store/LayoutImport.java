package com.baysheet.store;

import com.baysheet.project.StoredLevel;
import com.baysheet.project.LevelInfo;
import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Grid;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A grid and levels entered from a table (the CSV of docs/api.md) in one model change: the grid replaced as a grid
 * save replaces it (bays split and merge with their lines), the levels added, and those that name a typical made the
 * same as it. A level whose name is taken is refused: a file adds levels, it does not overwrite them.
 */
public final class LayoutImport {
    /**
     * A level of the table: its fields, the name of the level it is the same as (null: none) and the typical levels to
     * add above it (null: none).
     */
    public record Row(LevelInfo level, String sameAs, TypicalRepeat above) {
        public Row(LevelInfo level, String sameAs) { this(level, sameAs, null); }

        String describe() { return LevelStore.describe(level) + (above == null ? "" : ", and " + above.describe()); }
    }

    private final ModelWrites writes;

    public LayoutImport(ModelWrites writes) {
        this.writes = writes;
    }

    /** @param grid the new grid, or null to keep the project's */
    public void apply(Editor who, long projectId, long version, Grid grid, List<Row> levels) {
        if (grid == null && levels.isEmpty()) throw new InputError("csv", "no rows", "gives neither grid lines nor levels");
        String action = "grid and levels from a table: " + (grid == null ? "grid kept" : "grid " + GridStore.describe(grid))
                + (levels.isEmpty() ? "" : "; levels added: " + String.join(", ", levels.stream().map(Row::describe).toList()));
        writes.change(who, action, projectId, version, c -> {
            if (grid != null) GridStore.replace(c, projectId, grid);
            add(c, projectId, levels);
            return null;
        });
    }

    private static void add(Connection c, long projectId, List<Row> rows) throws SQLException {
        Map<String, Long> ids = new HashMap<>();
        for (StoredLevel l : LevelStore.findByProject(c, projectId)) ids.put(key(l.name()), l.id());
        Map<String, Long> added = new HashMap<>();
        for (Row r : rows) {
            if (ids.containsKey(key(r.level().name())))
                throw new InputError("levels[" + r.level().name() + "].name", r.level().name(), "is already a level of the project: "
                        + "a table adds levels (edit an existing one on its page, or leave it out)");
            long id = LevelStore.insert(c, projectId, r.level()).id();
            ids.put(key(r.level().name()), id);
            added.put(key(r.level().name()), id);
        }
        for (Row r : rows) {
            if (r.sameAs() == null) continue;
            Long typical = ids.get(key(r.sameAs()));
            if (typical == null) throw new InputError("levels[" + r.level().name() + "].sameAs", r.sameAs(), "names no level of the project");
            TypicalLevels.linkIn(c, projectId, typical, added.get(key(r.level().name())));
        }
        // after every row is in, so that a repeated level's name or elevation is checked against the whole table
        for (Row r : rows) if (r.above() != null) r.above().addAbove(c, projectId, added.get(key(r.level().name())));
    }

    private static String key(String name) { return name.strip().toLowerCase(); }
}
