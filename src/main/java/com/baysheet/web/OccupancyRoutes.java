package com.baysheet.web;

import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.project.FirmOccupancy;
import com.baysheet.store.Store;
import com.baysheet.web.entry.LengthField;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * The firm's own occupancies, beside the built-in catalogue, for every project: added, edited (new values change the
 * results of every project that uses one, as the edit page says before it is saved) and deleted (a confirmation page;
 * refused, naming the projects, while one is in use).
 */
record OccupancyRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/occupancies", this::list, Admit.OFFICE);
        r.post("/occupancies", this::create, Admit.PREPARER);
        r.get("/occupancies/{occupancy}/edit", this::editForm, Admit.OFFICE);
        r.post("/occupancies/{occupancy}", this::update, Admit.PREPARER);
        r.get("/occupancies/{occupancy}/delete", this::confirmDelete, Admit.OFFICE);
        r.post("/occupancies/{occupancy}/delete", this::delete, Admit.PREPARER);
    }

    void list(Context ctx) {
        render(ctx, Form.filled(Map.of("units", "US", "rule", "ORDINARY", "concentrated", "0", "contactSide", "30")));
    }

    void create(Context ctx) {
        Form form = Form.of(ctx);
        form.check("id", () -> new FirmOccupancy(form.text("id"), "name", UnitSystem.US, 1, 0, 1, ReductionRule.ORDINARY, false));
        occupancy(form, form.text("id"), o -> store.occupancies().add(Editors.of(ctx), o)).ifPresentOrElse(o -> Pages.seeOther(ctx, "/occupancies"),
                () -> render(ctx.status(form.stale() ? 409 : 422), form));
    }

    /** The occupancy the form gives (stored by {@code save}), or empty with every refusal on the form at once. */
    private static Optional<FirmOccupancy> occupancy(Form form, String id, Consumer<FirmOccupancy> save) {
        double uniform = form.number("uniform");
        double concentrated = form.number("concentrated");
        UnitSystem units = form.text("units").equals("SI") ? UnitSystem.SI : UnitSystem.US;
        double contactSide = form.length("contactSide", LengthField.small("Contact area side"), units);
        // the occupancy's own check of its name, run now so that every refusal shows at once
        form.check("name", () -> new FirmOccupancy("id", form.text("name"), units, 1, 0, 1, ReductionRule.ORDINARY, false));
        return form.attempt(() -> {
            FirmOccupancy o = new FirmOccupancy(id, form.text("name"), UnitSystem.parse("units", form.text("units")),
                    uniform, concentrated, contactSide, ReductionRule.parse("rule", form.text("rule")), form.checked("assembly"));
            save.accept(o);
            return o;
        });
    }

    void editForm(Context ctx) {
        FirmOccupancy o = store.occupancies().find(ctx.pathParam("occupancy"));
        Map<String, String> v = new HashMap<>(Map.of("name", o.name(), "units", o.units().name(), "uniform", Display.plain(o.uniform()),
                "concentrated", Display.plain(o.concentrated()), "contactSide", Display.plain(o.contactSide()), "rule", o.rule().name()));
        if (o.assembly()) v.put("assembly", "on");
        renderOne(ctx, "occupancies/edit", o, Form.filled(v));
    }

    void update(Context ctx) {
        FirmOccupancy was = store.occupancies().find(ctx.pathParam("occupancy"));
        Form form = Form.of(ctx);
        occupancy(form, was.id(), o -> {
            store.occupancies().update(Editors.of(ctx), o);
            // like every firm-wide change: each project's audit entry names the issued sheets the new values changed
            store.projects().firmChanged(Editors.of(ctx), "firm occupancy changed: " + o.id());
        }).ifPresentOrElse(o -> Pages.seeOther(ctx, Saved.OCCUPANCY.after("/occupancies")),
                () -> renderOne(ctx.status(form.stale() ? 409 : 422), "occupancies/edit", was, form));
    }

    void confirmDelete(Context ctx) {
        FirmOccupancy o = store.occupancies().find(ctx.pathParam("occupancy"));
        renderOne(ctx, "occupancies/delete", o, Form.filled(Map.of()));
    }

    void delete(Context ctx) {
        Form form = Form.of(ctx);
        Confirmed.require(form);
        FirmOccupancy o = store.occupancies().find(ctx.pathParam("occupancy"));
        form.attempt(() -> { store.occupancies().delete(Editors.of(ctx), o.id()); return o; })
                .ifPresentOrElse(done -> Pages.seeOther(ctx, Saved.DELETED_OCCUPANCY.after("/occupancies")),
                        () -> renderOne(ctx.status(form.stale() ? 409 : 422), "occupancies/delete", o, form));
    }

    private void renderOne(Context ctx, String template, FirmOccupancy o, Form form) {
        Map<String, Object> m = new HashMap<>();
        m.put("occupancy", o);
        m.put("usedBy", store.occupancies().usedBy(o.id()));
        m.put("form", form);
        m.put("rules", ReductionRule.values());
        ctx.render(template, m);
    }

    private void render(Context ctx, Form form) {
        ctx.render("occupancies/list", Map.of("form", form, "firm", store.occupancies().findAll(),
                "builtIn", OccupancyCatalogue.builtIn().all(), "rules", ReductionRule.values()));
    }
}
