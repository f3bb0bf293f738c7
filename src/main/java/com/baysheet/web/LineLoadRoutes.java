package com.baysheet.web;

import com.baysheet.project.LineLoadEntry;
import com.baysheet.store.Editor;
import com.baysheet.store.LineLoadStore;
import com.baysheet.store.Store;
import io.javalin.config.RoutesConfig;

import java.util.List;
import java.util.Map;

/** A level's line loads (cladding, walls, parapets along grid lines): listed, added, and deleted after its confirmation page. */
final class LineLoadRoutes {
    private final LevelLoadRoutes<LineLoadEntry> pages;

    LineLoadRoutes(Store store) {
        LineLoadStore loads = store.lineLoads();
        pages = new LevelLoadRoutes<>(store, "line-loads", "lineloads/list", Map.of("deadBy", "pressure"),
                (form, units) -> LineLoadForm.read(form), Ids::lineLoad, new LevelLoadRoutes.Loads<>() {
                    public List<?> findByLevel(long project, long level) { return loads.findByLevel(project, level); }

                    public Object add(Editor who, long project, long version, long level, LineLoadEntry e) {
                        return loads.add(who, project, version, level, e);
                    }

                    public java.util.Optional<String> describe(long project, long level, long id) {
                        return loads.findByLevel(project, level).stream().filter(l -> l.id() == id).findFirst().map(l -> l.label() + " (" + l.segment() + ")");
                    }

                    public void delete(Editor who, long project, long version, long level, long id) {
                        loads.delete(who, project, version, level, id);
                    }
                });
    }

    void install(RoutesConfig r) {
        pages.install(r, "lineLoad");
    }
}
