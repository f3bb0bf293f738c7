package com.baysheet.web;

import com.baysheet.web.auth.Admit;
import com.baysheet.framing.model.Submittal;
import com.baysheet.project.Project;
import com.baysheet.store.Store;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.Map;

/**
 * The submittal data of a project (engineer of record, licence, building code as adopted), a form of its own
 * on the settings page: saved over the project's version, refused beside the field it names.
 */
record SubmittalRoutes(Store store) {
    void install(RoutesConfig r) {
        r.post("/projects/{project}/settings/submittal", this::update, Admit.PREPARER);
    }

    void update(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        form.attempt(() -> store.projects().submittals().save(Editors.of(ctx), p.id(), version, read(p, form)))
                .ifPresentOrElse(saved -> Pages.seeOther(ctx, Saved.SUBMITTAL.after("/projects/" + p.id() + "/settings")),
                        () -> ProjectRoutes.renderSettings(ctx.status(form.stale() ? 409 : 422), store, p, null, null, form));
    }

    /** The form's fields over the project's own site address and client. */
    private static Submittal read(Project p, Form f) {
        return new Submittal(p.info().address(), p.info().client(), f.text("engineerOfRecord"), f.text("licenceNumber"),
                f.text("licenceState"), f.text("buildingCode"), f.text("codeYear"));
    }

    /** The submittal form as stored. */
    static Form filled(Store store, Project p) {
        Submittal s = store.projects().submittals().find(p.id());
        return Form.filled(Map.of("version", String.valueOf(p.version()), "engineerOfRecord", s.engineerOfRecord(),
                "licenceNumber", s.licenceNumber(), "licenceState", s.licenceState(), "buildingCode", s.buildingCode(),
                "codeYear", s.codeYear()));
    }
}
