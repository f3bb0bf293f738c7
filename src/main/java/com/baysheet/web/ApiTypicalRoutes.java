package com.baysheet.web;

import com.baysheet.web.auth.Admit;
import com.baysheet.engine.InputError;
import com.baysheet.store.ModelJson;
import com.baysheet.store.Store;
import com.fasterxml.jackson.databind.JsonNode;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.ArrayList;
import java.util.List;

/** Typical levels in the JSON API: link levels to a typical, repeat it above, copy its bays, unlink. See docs/api.md. */
record ApiTypicalRoutes(Store store) {
    private static final String LEVEL = "/api/projects/{project}/levels/{level}";

    void install(RoutesConfig r) {
        r.post(LEVEL + "/typical", ctx -> answer(ctx, b -> store.typicals().link(Editors.of(ctx), Ids.project(ctx),
                ModelJson.version(b), Ids.level(ctx), levelIds(b))), Admit.PREPARER);
        r.post(LEVEL + "/repeat", ctx -> answer(ctx, b -> store.typicals().repeat(Editors.of(ctx), Ids.project(ctx),
                ModelJson.version(b), Ids.level(ctx), whole(b, "count"), number(b, "storeyHeight"))), Admit.PREPARER);
        r.post(LEVEL + "/copy", ctx -> answer(ctx, b -> store.typicals().copy(Editors.of(ctx), Ids.project(ctx),
                ModelJson.version(b), Ids.level(ctx), levelIds(b))), Admit.PREPARER);
        r.post(LEVEL + "/unlink", ctx -> answer(ctx, b -> store.typicals().unlink(Editors.of(ctx), Ids.project(ctx),
                ModelJson.version(b), Ids.level(ctx))), Admit.PREPARER);
    }

    private interface Change {
        void run(JsonNode body);
    }

    /** Runs the change and answers with the project's new version and its levels as they now stand. */
    private void answer(Context ctx, Change change) {
        change.run(Json.body(ctx));
        long id = Ids.project(ctx);
        Json.send(ctx, 200, new ApiViews.Saved(store.projects().find(id).version(),
                store.levels().findByProject(id).stream().map(ApiViews.LevelJson::of).toList()));
    }

    private static List<Long> levelIds(JsonNode b) {
        JsonNode v = b.path("levels");
        if (!v.isArray() || v.isEmpty()) throw new InputError("levels", v.isMissingNode() ? "nothing" : v, "give the level ids as [id, ...]");
        List<Long> out = new ArrayList<>();
        for (JsonNode id : v) {
            if (!id.isIntegralNumber() || !id.canConvertToLong()) throw new InputError("levels", id, "a level is given by its id");
            out.add(id.asLong());
        }
        return out;
    }

    private static int whole(JsonNode b, String field) {
        JsonNode v = b.path(field);
        if (!v.isIntegralNumber() || !v.canConvertToInt()) throw new InputError(field, v.isMissingNode() ? "nothing" : v, "must be a whole number");
        return v.asInt();
    }

    private static double number(JsonNode b, String field) {
        JsonNode v = b.path(field);
        if (!v.isNumber()) throw new InputError(field, v.isMissingNode() ? "nothing" : v, "must be a number");
        return v.asDouble();
    }
}
