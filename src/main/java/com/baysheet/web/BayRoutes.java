package com.baysheet.web;

import com.baysheet.framing.model.Bay;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** The bay editor of a level: select several bays, then give them an occupancy and framing, make them an opening, or clear them. */
record BayRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/projects/{project}/levels/{level}/bays", this::edit, Admit.OFFICE);
        r.post("/projects/{project}/levels/{level}/bays", this::apply, Admit.PREPARER);
    }

    void edit(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        Map<String, String> start = new HashMap<>(Map.of("beams", "Y", "infillBeams", "2", "occupancy", "office"));
        // after an Apply the form comes back with the values just applied (post-redirect-get carries them in the query)
        for (String f : BayForm.FIELDS) if (ctx.queryParam(f) != null) start.put(f, ctx.queryParam(f));
        start.put("version", String.valueOf(p.version()));
        render(ctx, p, l, Form.filled(start));
    }

    void apply(Context ctx) {
        Project p = store.projects().find(Ids.project(ctx));
        StoredLevel l = store.levels().find(p.id(), Ids.level(ctx));
        Form form = Form.of(ctx);
        long version = form.version();
        List<Cell> cells = BayForm.cells(form);
        String action = form.text("action");
        if (action.equals("count")) {
            count(ctx, p, l, form, version, cells);
            return;
        }
        if (action.equals("clear") && !cells.isEmpty() && !"yes".equals(form.text("confirm"))) {
            ClearBaysPage.render(ctx, store, p, l, form, cells);
            return;
        }
        String report = "";
        Optional<Object> done = switch (action) {
            case "clear" -> form.attempt(() -> { store.bays().clear(Editors.of(ctx), p.id(), version, l.id(), cells); return action; });
            case "opening" -> form.attempt(() -> { store.bays().assign(Editors.of(ctx), p.id(), version, l.id(), BayAssignment.opening(cells)); return action; });
            default -> {
                BayForm.Values v = BayForm.read(form, p.info().units());
                report = CantileverReport.param(form, cells, store.grids().find(p.id()));
                yield form.attempt(() -> { store.bays().assign(Editors.of(ctx), p.id(), version, l.id(), v.assignment(cells)); return action; });
            }
        };
        String bays = "/projects/" + p.id() + "/levels/" + l.id() + "/bays" + BayForm.kept(form) + report;
        String then = action.equals("clear") ? Saved.CLEARED.after(bays) : bays;
        done.ifPresentOrElse(a -> Pages.seeOther(ctx, then),
                () -> render(ctx.status(form.stale() ? 409 : 422), p, l, form));
    }

    /** Before saving: how many issued sheets the change would alter, computed from their fingerprints; nothing is saved. */
    private void count(Context ctx, Project p, StoredLevel l, Form form, long version, List<Cell> cells) {
        BayForm.Values v = BayForm.read(form, p.info().units());
        Optional<List<String>> touched = form.attempt(() -> store.bays().touchedByAssign(p.id(), version, l.id(), v.assignment(cells)));
        ctx.status(touched.isPresent() ? 200 : form.stale() ? 409 : 422);
        ctx.attribute("touched", touched.orElse(null));
        render(ctx, p, l, form);
    }

    private void render(Context ctx, Project p, StoredLevel l, Form form) {
        var computed = store.results().of(p.id());
        var catalogue = computed.model().building().context().catalogue();
        List<Bay> bays = store.bays().findByLevel(p.id(), l.id());
        Map<String, Object> m = new HashMap<>();
        m.put("project", computed.project());
        m.put("level", l);
        m.put("levels", computed.model().levels());
        m.put("typicalName", !l.linked() ? "" : computed.model().levels().stream().filter(o -> o.id() == l.typicalOf())
                .map(StoredLevel::name).findFirst().orElse(""));
        m.put("form", form);
        m.put("touched", ctx.attribute("touched"));
        m.put("units", UnitLabels.of(p.info().units()));
        m.put("sides", BayForm.SIDES);
        m.put("occupancies", catalogue.all());
        m.put("balconies", catalogue.balconies());
        var loads = computed.model().building().lineLoads().stream().filter(w -> w.level().equals(l.name())).toList();
        m.put("table", BayGridView.of(computed.model().building().grid(), bays, loads, catalogue, new HashSet<>(form.values("cells")),
                UnitLabels.of(p.info().units())));
        Map<String, String> kept = new HashMap<>();
        for (String f : BayForm.FIELDS) kept.put(f, form.value(f));
        m.put("cantileverReport", CantileverReport.lines(ctx.queryParam(CantileverReport.PARAM), kept,
                computed.model().building().grid(), bays, UnitLabels.of(p.info().units())));
        m.put("slabLimit", UnitLabels.of(p.info().units()).length(com.baysheet.framing.model.SlabSpan.limit(p.info().units())));
        ctx.render("bays/edit", m);
    }
}
