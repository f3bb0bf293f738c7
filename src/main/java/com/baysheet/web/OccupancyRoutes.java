package com.baysheet.web;

import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.project.FirmOccupancy;
import com.baysheet.store.Store;
import com.baysheet.web.entry.LengthField;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.Map;

/** The firm's own occupancies, beside the built-in catalogue, for every project. */
final class OccupancyRoutes {
    private final Store store;

    OccupancyRoutes(Store store) {
        this.store = store;
    }

    void install(RoutesConfig r) {
        r.get("/occupancies", this::list, Admit.OFFICE);
        r.post("/occupancies", this::create, Admit.PREPARER);
    }

    void list(Context ctx) {
        render(ctx, Form.filled(Map.of("units", "US", "rule", "ORDINARY", "concentrated", "0", "contactSide", "30")));
    }

    void create(Context ctx) {
        Form form = Form.of(ctx);
        double uniform = form.number("uniform");
        double concentrated = form.number("concentrated");
        UnitSystem units = form.text("units").equals("SI") ? UnitSystem.SI : UnitSystem.US;
        double contactSide = form.length("contactSide", LengthField.small("Contact area side"), units);
        // the occupancy's own checks of its id and name, run now so that every refusal shows at once
        form.check("id", () -> new FirmOccupancy(form.text("id"), "name", units, 1, 0, 1, ReductionRule.ORDINARY, false));
        form.check("name", () -> new FirmOccupancy("id", form.text("name"), units, 1, 0, 1, ReductionRule.ORDINARY, false));
        form.attempt(() -> {
            FirmOccupancy o = new FirmOccupancy(form.text("id"), form.text("name"), UnitSystem.parse("units", form.text("units")),
                    uniform, concentrated, contactSide, ReductionRule.parse("rule", form.text("rule")), form.checked("assembly"));
            store.occupancies().add(Editors.of(ctx), o);
            return o;
        }).ifPresentOrElse(o -> Pages.seeOther(ctx, "/occupancies"), () -> render(ctx.status(form.stale() ? 409 : 422), form));
    }

    private void render(Context ctx, Form form) {
        ctx.render("occupancies/list", Map.of("form", form, "firm", store.occupancies().findAll(),
                "builtIn", OccupancyCatalogue.builtIn().all(), "rules", ReductionRule.values()));
    }
}
