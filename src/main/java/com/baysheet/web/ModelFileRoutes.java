package com.baysheet.web;

import com.baysheet.web.auth.Admit;
import com.baysheet.engine.InputError;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.project.Project;
import com.baysheet.store.Store;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.UploadedFile;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.Map;

/**
 * A project's model as one JSON file: download it from the project's page, upload one as a new project (the page
 * and the API alike), in the shape docs/api.md gives. Installed ahead of the project routes, so that
 * /projects/import is this page and not a project.
 */
record ModelFileRoutes(Store store) {
    /** A model file larger than this is refused before it is read (a JSON tree takes several times its text in memory). */
    static final long MAX_FILE = 5_000_000;

    void install(RoutesConfig r) {
        r.get("/projects/{project}/model.json", this::download, Admit.OFFICE);
        r.get("/api/projects/{project}/model", this::download, Admit.OFFICE);
        r.get("/projects/import", ctx -> render(ctx, Form.filled(Map.of())), Admit.OFFICE);
        r.post("/projects/import", this::upload, Admit.PREPARER);
        r.post("/api/projects/import", ctx -> {
            JsonNode body = Json.body(ctx);
            Project p = store.imports().create(Editors.of(ctx), body.path("model"), body.path("jobNumber").asText(""));
            ctx.header("Location", "/api/projects/" + p.id());
            Json.send(ctx, 201, p);
        }, Admit.PREPARER);
    }

    void download(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        String name = p.info().jobNumber().replaceAll("[^A-Za-z0-9._-]", "_") + "-model.json";
        ctx.header("Content-Disposition", "attachment; filename=\"" + name + "\"");
        Json.send(ctx, store.exports().of(p.id()));
    }

    void upload(Context ctx) {
        Form form = Form.of(ctx);
        JsonNode file = read(ctx.uploadedFile("file"), form);
        form.attempt(() -> store.imports().create(Editors.of(ctx), file, form.text("jobNumber")))
                .ifPresentOrElse(p -> Pages.seeOther(ctx, "/projects/" + p.id()),
                        () -> render(ctx.status(form.stale() ? 409 : 422), form));
    }

    /** The uploaded file as JSON, or null with the refusal on the form. */
    private static JsonNode read(UploadedFile f, Form form) {
        if (f == null || f.size() == 0) {
            form.reject("file", "choose a model file (.json) exported from a project");
            return null;
        }
        if (f.size() > MAX_FILE) {
            form.reject("file", "is " + f.size() + " bytes; a model file may be at most " + MAX_FILE);
            return null;
        }
        try (InputStream in = f.content()) {
            return RecordJson.mapper().readTree(in);
        } catch (JsonProcessingException e) {
            form.reject("file", "is not valid JSON: " + e.getOriginalMessage());
            return null;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void render(Context ctx, Form form) {
        Map<String, Object> m = new HashMap<>();
        m.put("form", form);
        ctx.render("projects/import", m);
    }
}
