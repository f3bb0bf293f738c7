package com.baysheet.web;

import com.baysheet.engine.InputError;
import com.baysheet.store.ModelJson;
import com.baysheet.project.Project;
import com.baysheet.store.Store;
import com.fasterxml.jackson.databind.JsonNode;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.Map;

/** The JSON API for the model: projects, grid, levels, bays, line loads and the firm's occupancies. See docs/api.md. */
record ApiRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/api/projects", ctx -> Json.send(ctx, store.projects().findAll()), Admit.OFFICE);
        r.post("/api/projects", this::createProject, Admit.PREPARER);
        r.get("/api/projects/{project}", this::showProject, Admit.OFFICE);
        r.put("/api/projects/{project}", this::updateProject, Admit.PREPARER);
        r.put("/api/projects/{project}/grid", this::updateGrid, Admit.PREPARER);
        r.get("/api/projects/{project}/levels", ctx -> Json.send(ctx,
                store.levels().findByProject(Ids.project(ctx)).stream().map(ApiViews.LevelJson::of).toList()), Admit.OFFICE);
        r.post("/api/projects/{project}/levels", this::createLevel, Admit.PREPARER);
        r.put("/api/projects/{project}/levels/{level}", this::updateLevel, Admit.PREPARER);
        r.delete("/api/projects/{project}/levels/{level}", this::deleteLevel, Admit.PREPARER);
        r.get("/api/projects/{project}/levels/{level}/bays", ctx -> Json.send(ctx,
                store.bays().findByLevel(Ids.project(ctx), Ids.level(ctx)).stream().map(ApiViews.BayJson::of).toList()), Admit.OFFICE);
        r.post("/api/projects/{project}/levels/{level}/bays", this::assignBays, Admit.PREPARER);
        r.post("/api/projects/{project}/levels/{level}/bays/clear", this::clearBays, Admit.PREPARER);
        r.get("/api/projects/{project}/levels/{level}/line-loads", ctx -> Json.send(ctx,
                store.lineLoads().findByLevel(Ids.project(ctx), Ids.level(ctx)).stream().map(ApiViews.LineLoadJson::of).toList()), Admit.OFFICE);
        r.post("/api/projects/{project}/levels/{level}/line-loads", this::addLineLoad, Admit.PREPARER);
        r.delete("/api/projects/{project}/levels/{level}/line-loads/{lineLoad}", this::deleteLineLoad, Admit.PREPARER);
        r.get("/api/projects/{project}/levels/{level}/point-loads", ctx -> Json.send(ctx,
                store.pointLoads().findByLevel(Ids.project(ctx), Ids.level(ctx)).stream().map(ApiViews.PointLoadJson::of).toList()), Admit.OFFICE);
        r.post("/api/projects/{project}/levels/{level}/point-loads", this::addPointLoad, Admit.PREPARER);
        r.delete("/api/projects/{project}/levels/{level}/point-loads/{pointLoad}", this::deletePointLoad, Admit.PREPARER);
        r.get("/api/occupancies", ctx -> Json.send(ctx, store.occupancies().findAll()), Admit.OFFICE);
        r.post("/api/occupancies", ctx -> {
            store.occupancies().add(Editors.of(ctx), ModelJson.firmOccupancy(Json.body(ctx)));
            Json.send(ctx, 201, store.occupancies().findAll());
        }, Admit.PREPARER);
    }

    void createProject(Context ctx) {
        Project p = store.projects().create(Editors.of(ctx), ModelJson.project(Json.body(ctx), FirmOnPage.defaultEdition(ctx)));
        ctx.header("Location", "/api/projects/" + p.id());
        Json.send(ctx, 201, p);
    }

    void showProject(Context ctx) {
        long id = Ids.project(ctx);
        Project p = store.projects().find(id);
        Json.send(ctx, Map.of("project", p, "grid", store.grids().find(id),
                "levels", store.levels().findByProject(id).stream().map(ApiViews.LevelJson::of).toList()));
    }

    void updateProject(Context ctx) {
        JsonNode body = Json.body(ctx);
        long id = Ids.project(ctx);
        // a change that names no edition keeps the project's own
        String edition = store.projects().find(id).info().edition();
        Json.send(ctx, store.projects().update(Editors.of(ctx), id, ModelJson.version(body), ModelJson.project(body, edition)));
    }

    void updateGrid(Context ctx) {
        JsonNode body = Json.body(ctx);
        long id = Ids.project(ctx);
        store.grids().save(Editors.of(ctx), id, ModelJson.version(body), ModelJson.grid(body));
        saved(ctx, 200, id, store.grids().find(id));
    }

    void createLevel(Context ctx) {
        JsonNode body = Json.body(ctx);
        long id = Ids.project(ctx);
        var level = store.levels().add(Editors.of(ctx), id, ModelJson.version(body), ModelJson.level(body));
        ctx.header("Location", "/api/projects/" + id + "/levels/" + level.id());
        saved(ctx, 201, id, ApiViews.LevelJson.of(level));
    }

    void updateLevel(Context ctx) {
        JsonNode body = Json.body(ctx);
        long id = Ids.project(ctx);
        store.levels().update(Editors.of(ctx), id, ModelJson.version(body), Ids.level(ctx), ModelJson.level(body));
        saved(ctx, 200, id, ApiViews.LevelJson.of(store.levels().find(id, Ids.level(ctx))));
    }

    /** DELETE carries the version as ?version=N, since a DELETE has no body by convention. */
    void deleteLevel(Context ctx) {
        long id = Ids.project(ctx);
        long version = queryVersion(ctx.queryParam("version"));
        store.levels().delete(Editors.of(ctx), id, version, Ids.level(ctx));
        saved(ctx, 200, id, Map.of("deleted", Ids.level(ctx)));
    }

    void assignBays(Context ctx) {
        JsonNode body = Json.body(ctx);
        long id = Ids.project(ctx);
        store.bays().assign(Editors.of(ctx), id, ModelJson.version(body), Ids.level(ctx), ModelJson.bays(body, store.grids().find(id)));
        saved(ctx, 200, id, store.bays().findByLevel(id, Ids.level(ctx)).stream().map(ApiViews.BayJson::of).toList());
    }

    void clearBays(Context ctx) {
        JsonNode body = Json.body(ctx);
        long id = Ids.project(ctx);
        store.bays().clear(Editors.of(ctx), id, ModelJson.version(body), Ids.level(ctx), ModelJson.cells(body, store.grids().find(id)));
        saved(ctx, 200, id, store.bays().findByLevel(id, Ids.level(ctx)).stream().map(ApiViews.BayJson::of).toList());
    }

    void addLineLoad(Context ctx) {
        JsonNode body = Json.body(ctx);
        long id = Ids.project(ctx);
        var saved = store.lineLoads().add(Editors.of(ctx), id, ModelJson.version(body), Ids.level(ctx), ModelJson.lineLoad(body));
        ctx.header("Location", "/api/projects/" + id + "/levels/" + Ids.level(ctx) + "/line-loads/" + saved.id());
        saved(ctx, 201, id, ApiViews.LineLoadJson.of(saved));
    }

    void addPointLoad(Context ctx) {
        JsonNode body = Json.body(ctx);
        long id = Ids.project(ctx);
        var saved = store.pointLoads().add(Editors.of(ctx), id, ModelJson.version(body), Ids.level(ctx), ModelJson.pointLoad(body));
        ctx.header("Location", "/api/projects/" + id + "/levels/" + Ids.level(ctx) + "/point-loads/" + saved.id());
        saved(ctx, 201, id, ApiViews.PointLoadJson.of(saved));
    }

    void deletePointLoad(Context ctx) {
        long id = Ids.project(ctx);
        store.pointLoads().delete(Editors.of(ctx), id, queryVersion(ctx.queryParam("version")), Ids.level(ctx), Ids.pointLoad(ctx));
        saved(ctx, 200, id, Map.of("deleted", Ids.pointLoad(ctx)));
    }

    void deleteLineLoad(Context ctx) {
        long id = Ids.project(ctx);
        store.lineLoads().delete(Editors.of(ctx), id, queryVersion(ctx.queryParam("version")), Ids.level(ctx), Ids.lineLoad(ctx));
        saved(ctx, 200, id, Map.of("deleted", Ids.lineLoad(ctx)));
    }

    /** Answers a model change with the project's new version, which the next change must carry. */
    private void saved(Context ctx, int status, long projectId, Object what) {
        Json.send(ctx, status, new ApiViews.Saved(store.projects().find(projectId).version(), what));
    }

    private static long queryVersion(String text) {
        try {
            return Long.parseLong(text == null ? "" : text.strip());
        } catch (NumberFormatException e) {
            throw new InputError("version", text, "give the version this change is based on as ?version=N");
        }
    }
}
