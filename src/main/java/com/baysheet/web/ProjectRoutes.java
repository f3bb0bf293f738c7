package com.baysheet.web;

import com.baysheet.engine.code.Editions;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.project.Project;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.SnowInput;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.units.Display;
import com.baysheet.store.Store;
import com.baysheet.auth.User;
import com.baysheet.review.Actor;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.web.auth.Access;
import com.baysheet.web.auth.Admit;
import com.baysheet.web.review.OfficeQueue;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.Map;

/** Projects: the list, a new project, its overview and its settings. */
record ProjectRoutes(Store store, ReviewStore review) {
    void install(RoutesConfig r) {
        r.get("/", ctx -> ctx.redirect("/projects"), Admit.OFFICE);
        r.get("/projects", this::list, Admit.OFFICE);
        r.get("/projects/new", this::newForm, Admit.OFFICE);
        r.post("/projects", this::create, Admit.PREPARER);
        r.get("/projects/{project}", this::show, Admit.OFFICE);
        r.get("/projects/{project}/settings", this::settingsForm, Admit.OFFICE);
        r.post("/projects/{project}/settings", this::updateSettings, Admit.PREPARER);
    }

    void list(Context ctx) {
        // the default list is the current work; ?archived=yes lists the archived projects instead
        boolean archived = "yes".equals(ctx.queryParam("archived"));
        var projects = store.projects().findAll(archived);
        Map<String, Object> m = new HashMap<>(Map.of("projects", projects, "archived", archived));
        // the home page says what waits for whoever prepares or checks: their own check queue, counted
        User user = Access.user(ctx);
        if (!archived && user.role().mayPrepare()) m.put("waiting", OfficeQueue.of(store, review, projects, Actor.of(user)));
        ctx.render("projects/list", m);
    }

    void newForm(Context ctx) {
        renderForm(ctx, "projects/new", null, Form.filled(Map.of("edition", FirmOnPage.defaultEdition(ctx), "units", "US")));
    }

    void create(Context ctx) {
        Form form = Form.of(ctx);
        form.attempt(() -> store.projects().create(Editors.of(ctx), info(form)))
                .ifPresentOrElse(p -> Pages.seeOther(ctx, "/projects/" + p.id()),
                        () -> renderForm(ctx.status(form.stale() ? 409 : 422), "projects/new", null, form));
    }

    void show(Context ctx) {
        var computed = store.results().of(Ids.project(ctx));
        ctx.render("projects/show", Map.of("project", computed.project(), "model", computed.model(),
                "derived", computed.derived(), "units", UnitLabels.of(computed.project().info().units()),
                "noRoof", computed.model().levels().stream().noneMatch(l -> l.info().roof())));
    }

    void settingsForm(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        renderSettings(ctx, store, p, Form.filled(values(p)), null, null);
    }

    /**
     * The settings page with the project form, the self weight form and the submittal form
     * ({@link SubmittalRoutes}); null for any of them: filled from the store.
     */
    static void renderSettings(Context ctx, Store store, Project p, Form form, Form weights, Form submittal) {
        Map<String, Object> m = new HashMap<>(model(form != null ? form : Form.filled(values(p))));
        m.put("submittal", submittal != null ? submittal : SubmittalRoutes.filled(store, p));
        m.put("project", p);
        m.put("weightsForm", weights != null ? weights : Form.filled(SelfWeightRoutes.values(store, p)));
        m.put("firmWeights", store.selfWeights().firmDefaults(p.id()));
        m.put("ownWeights", store.selfWeights().find(p.id()).isPresent());
        m.put("units", UnitLabels.of(p.info().units()));
        ctx.render("projects/settings", m);
    }

    void updateSettings(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        form.attempt(() -> store.projects().update(Editors.of(ctx), p.id(), version, info(form)))
                .ifPresentOrElse(saved -> Pages.seeOther(ctx, Saved.PROJECT.after("/projects/" + p.id())),
                        () -> renderSettings(ctx.status(form.stale() ? 409 : 422), store, p, form, null, null));
    }

    private void renderForm(Context ctx, String template, Project p, Form form) {
        Map<String, Object> m = model(form);
        if (p != null) m.put("project", p);
        ctx.render(template, m);
    }

    private static Map<String, Object> model(Form form) {
        Map<String, Object> m = new HashMap<>();
        m.put("form", form);
        m.put("editions", Editions.builtIn().ids());
        m.put("unitSystems", UnitSystem.values());
        m.put("floorMethods", com.baysheet.engine.reduction.FloorMethods.builtIn().all());
        m.put("snowTerrains", com.baysheet.engine.snow.Exposure.Terrain.values());
        m.put("snowExposures", com.baysheet.engine.snow.Exposure.Shelter.values());
        m.put("thermalConditions", com.baysheet.engine.snow.Thermal.Condition.values());
        m.put("riskCategories", com.baysheet.engine.snow.Importance.RiskCategory.values());
        return m;
    }

    private static ProjectInfo info(Form f) {
        UnitSystem units = UnitSystem.parse("units", f.text("units"));
        return new ProjectInfo(f.text("jobNumber"), f.text("name"), f.text("address"), f.text("client"),
                f.text("edition"), units, f.checked("partitionAllowance"), f.checked("reducePartitions"),
                f.checked("upliftReducedDead"), snow(f), f.text("floorMethod"));
    }

    /** The snow fields (all ignored where groundSnow is blank: no snow); numbers read with the form's own parsing. */
    private static SnowSite snow(Form f) {
        double pg = f.optionalNumber("groundSnow"), ce = f.optionalNumber("exposureFactor"), ct = f.optionalNumber("thermalFactor");
        // a number that did not parse is already on the form: refuse the whole save rather than store no snow
        for (String field : new String[] {"groundSnow", "exposureFactor", "thermalFactor"})
            if (f.hasError(field)) throw new com.baysheet.engine.InputError(field, f.text(field), f.error(field));
        return SnowInput.of(pg, f.text("snowTerrain"), f.text("snowExposure"), ce, f.text("thermalCondition"), ct, f.text("riskCategory"));
    }

    static Map<String, String> values(Project p) {
        ProjectInfo i = p.info();
        Map<String, String> v = new HashMap<>(Map.of("version", String.valueOf(p.version()), "jobNumber", i.jobNumber(),
                "name", i.name(), "address", i.address(), "client", i.client(), "edition", i.edition(),
                "units", i.units().name()));
        if (i.partitionAllowance()) v.put("partitionAllowance", "on");
        if (i.reducePartitions()) v.put("reducePartitions", "on");
        if (i.upliftReducedDead()) v.put("upliftReducedDead", "on");
        v.put("floorMethod", i.floorMethod() == null ? "" : i.floorMethod());
        SnowInput.fields(i.snow()).forEach((k, x) -> v.put(k, x instanceof Double d ? Display.plain(d) : String.valueOf(x)));
        return v;
    }
}
