package com.baysheet.web;

import com.baysheet.store.Editor;
import com.baysheet.store.PointLoadEntry;
import com.baysheet.store.PointLoadStore;
import com.baysheet.store.Store;
import io.javalin.config.RoutesConfig;

import java.util.List;
import java.util.Map;

/** A level's point loads (rooftop units, tanks, hung equipment, in a bay or on a member): listed, added, and deleted after its confirmation page. */
final class PointLoadRoutes {
    private final LevelLoadRoutes<PointLoadEntry> pages;

    PointLoadRoutes(Store store) {
        PointLoadStore loads = store.pointLoads();
        pages = new LevelLoadRoutes<>(store, "point-loads", "pointloads/list", Map.of("placeBy", "bay"), PointLoadForm::read,
                Ids::pointLoad, new LevelLoadRoutes.Loads<>() {
                    public List<?> findByLevel(long project, long level) { return loads.findByLevel(project, level); }

                    public Object add(Editor who, long project, long version, long level, PointLoadEntry e) {
                        return loads.add(who, project, version, level, e);
                    }

                    public java.util.Optional<String> describe(long project, long level, long id) {
                        return loads.findByLevel(project, level).stream().filter(l -> l.id() == id).findFirst().map(l -> l.label() + " (" + l.where() + ")");
                    }

                    public void delete(Editor who, long project, long version, long level, long id) {
                        loads.delete(who, project, version, level, id);
                    }
                });
    }

    void install(RoutesConfig r) {
        pages.install(r, "pointLoad");
    }
}
