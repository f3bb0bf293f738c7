package com.baysheet.web;

import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Store;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A level's page: its fields, and its typical-level forms (what it is the same as, the levels the same as it,
 * the levels its bays may be copied to or that may be made the same as it).
 */
final class LevelPage {
    private LevelPage() {}

    static void render(Context ctx, Store store, Project p, StoredLevel l, Form form, Form typicalForm) {
        List<StoredLevel> all = store.levels().findByProject(p.id());
        Map<Long, String> names = new HashMap<>();
        for (StoredLevel o : all) names.put(o.id(), o.name());
        Map<String, Object> m = new HashMap<>();
        m.put("project", p);
        m.put("level", l);
        m.put("form", form);
        m.put("typicalForm", typicalForm);
        m.put("units", UnitLabels.of(p.info().units()));
        m.put("typicalName", l.linked() ? names.get(l.typicalOf()) : "");
        m.put("followers", all.stream().filter(o -> o.linked() && o.typicalOf() == l.id()).map(StoredLevel::name).toList());
        // the levels this one's bays may go to: the others, of its kind, that are no typical themselves
        m.put("others", all.stream().filter(o -> o.id() != l.id() && o.info().roof() == l.info().roof()
                && all.stream().noneMatch(f -> f.linked() && f.typicalOf() == o.id())).toList());
        m.put("levelNames", names);
        ctx.render("levels/edit", m);
    }
}
