package com.baysheet.web;

import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.Map;

/** Levels and grid: the grid lines with their spacings, the list of levels, adding and editing a level (removing one: {@link DeleteRoutes}). */
record LevelRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/projects/{project}/levels", this::show, Admit.OFFICE);
        r.post("/projects/{project}/grid", this::updateGrid, Admit.PREPARER);
        r.post("/projects/{project}/levels", this::create, Admit.PREPARER);
        r.post("/projects/{project}/levels/csv", this::fromTable, Admit.PREPARER);
        r.get("/projects/{project}/levels/{level}/edit", this::editForm, Admit.OFFICE);
        r.post("/projects/{project}/levels/{level}", this::update, Admit.PREPARER);
    }

    void show(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        renderPage(ctx, p, Form.filled(gridValues(p)), Form.filled(Map.of("version", String.valueOf(p.version()))));
    }

    void updateGrid(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        var grid = GridForm.read(form, p.info().units());
        form.attempt(() -> {
            store.grids().save(Editors.of(ctx), p.id(), version, grid.get());
            return p;
        }).ifPresentOrElse(saved -> Pages.seeOther(ctx, "/projects/" + p.id() + "/levels"),
                () -> renderPage(ctx.status(form.stale() ? 409 : 422), p, form, Form.filled(Map.of("version", String.valueOf(p.version())))));
    }

    void create(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        LevelForm.Values v = LevelForm.read(form, p.info().units());
        LevelForm.Repeat repeat = LevelForm.repeat(form, p.info().units());
        form.attempt(() -> store.levels().add(Editors.of(ctx), p.id(), version, v.info(), repeat.rule()))
                .ifPresentOrElse(l -> Pages.seeOther(ctx, "/projects/" + p.id() + "/levels"),
                        () -> renderPage(ctx.status(form.stale() ? 409 : 422), p, Form.filled(gridValues(p)), form));
    }

    /** The grid and levels from a table (a CSV file, or its text pasted), every refusal shown at once. */
    void fromTable(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        LayoutCsv table = LayoutCsv.read(TableUpload.text(ctx, form), p.info().units());
        if (!table.refusals().isEmpty()) form.reject("csv", String.join("; ", table.refusals()));
        form.attempt(() -> {
            store.layouts().apply(Editors.of(ctx), p.id(), version, table.grid(), table.levels());
            return p;
        }).ifPresentOrElse(saved -> Pages.seeOther(ctx, "/projects/" + p.id() + "/levels"),
                () -> renderPage(ctx.status(form.stale() ? 409 : 422), p, Form.filled(gridValues(p)),
                        Form.filled(Map.of("version", String.valueOf(p.version()))), form));
    }

    void editForm(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        renderEdit(ctx, p, l, Form.filled(LevelForm.values(l, p.version())));
    }

    void update(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        LevelForm.Values v = LevelForm.read(form, p.info().units());
        form.attempt(() -> {
            store.levels().update(Editors.of(ctx), p.id(), version, l.id(), v.info());
            return l;
        }).ifPresentOrElse(saved -> Pages.seeOther(ctx, "/projects/" + p.id() + "/levels"),
                () -> renderEdit(ctx.status(form.stale() ? 409 : 422), p, l, form));
    }

    private Map<String, String> gridValues(Project p) {
        Map<String, String> v = new HashMap<>(GridForm.values(store.grids().find(p.id())));
        v.put("version", String.valueOf(p.version()));
        return v;
    }

    private void renderPage(Context ctx, Project p, Form gridForm, Form levelForm) {
        renderPage(ctx, p, gridForm, levelForm, Form.filled(Map.of("version", String.valueOf(p.version()))));
    }

    private void renderPage(Context ctx, Project p, Form gridForm, Form levelForm, Form csvForm) {
        var computed = store.results().of(p.id());
        Map<String, Object> m = new HashMap<>();
        m.put("project", computed.project());
        m.put("levels", computed.model().levels());
        Map<Long, String> names = new HashMap<>();
        for (StoredLevel l : computed.model().levels()) names.put(l.id(), l.name());
        m.put("levelNames", names);
        m.put("grid", computed.model().building().grid());
        m.put("units", UnitLabels.of(p.info().units()));
        m.put("gridForm", gridForm);
        m.put("levelForm", levelForm);
        m.put("csvForm", csvForm);
        ctx.render("levels/index", m);
    }

    private void renderEdit(Context ctx, Project p, StoredLevel l, Form form) {
        LevelPage.render(ctx, store, p, l, form, Form.filled(Map.of("version", form.value("version"))));
    }
}
