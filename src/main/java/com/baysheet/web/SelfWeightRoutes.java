package com.baysheet.web;

import com.baysheet.web.auth.Admit;
import com.baysheet.engine.InputError;
import com.baysheet.engine.units.Display;
import com.baysheet.project.Project;
import com.baysheet.store.ProjectSelfWeights;
import com.baysheet.store.Store;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A project's own self weights by role, on its settings page: all four given override the firm's defaults (every sheet
 * then says "project value"), all four blank go back to the firm's ("firm default").
 */
record SelfWeightRoutes(Store store) {
    static final List<String> FIELDS = List.of("swInfillBeam", "swGridBeam", "swGirder", "swColumn");

    void install(RoutesConfig r) {
        r.post("/projects/{project}/self-weights", this::update, Admit.PREPARER);
    }

    void update(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        ProjectSelfWeights w = read(form);
        form.attempt(() -> { store.selfWeights().set(Editors.of(ctx), p.id(), version, w); return p.id(); })
                .ifPresentOrElse(done -> Pages.seeOther(ctx, "/projects/" + p.id() + "/settings"),
                        () -> ProjectRoutes.renderSettings(ctx.status(form.stale() ? 409 : 422), store, p, null, form, null));
    }

    /** The four values, or null for the firm's defaults (all blank); some blank and some given is refused. */
    private static ProjectSelfWeights read(Form f) {
        double[] v = new double[4];
        int given = 0;
        for (int i = 0; i < 4; i++) {
            v[i] = f.optionalNumber(FIELDS.get(i));
            if (!Double.isNaN(v[i])) given++;
        }
        if (given == 0 || !f.ok()) return null;
        for (int i = 0; i < 4; i++)
            if (Double.isNaN(v[i])) f.reject(FIELDS.get(i), "give all four self weights, or none to take the firm's defaults");
        if (!f.ok()) return null;
        try {
            return new ProjectSelfWeights(v[0], v[1], v[2], v[3]);
        } catch (InputError e) {
            f.reject(e.field(), e.problem());
            return null;
        }
    }

    /** The form's values: the project's own, blank where it takes the firm's defaults. */
    static Map<String, String> values(Store store, Project p) {
        Map<String, String> m = new HashMap<>(Map.of("version", String.valueOf(p.version())));
        store.selfWeights().find(p.id()).ifPresent(w -> {
            double[] v = {w.infillBeam(), w.gridBeam(), w.girder(), w.column()};
            for (int i = 0; i < 4; i++) m.put(FIELDS.get(i), Display.plain(v[i]));
        });
        return m;
    }
}
