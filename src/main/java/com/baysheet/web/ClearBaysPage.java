package com.baysheet.web;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.project.Cell;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Store;
import io.javalin.http.Context;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The confirmation before ticked bays are left unframed (a delete of what they hold): each bay by its grid name with
 * what it holds now, and a form that sends the same selection again with {@code confirm=yes} and the editor's values,
 * so that the editor comes back as it was. Nothing is read from or written to the model but the bays shown.
 */
final class ClearBaysPage {
    /** One ticked bay: its grid name and what it holds ("office, 50 psf dead", "an opening", "nothing yet"). */
    record Line(String bay, String holds) {}

    /** A hidden field of the confirming form. */
    record Field(String name, String value) {}

    private ClearBaysPage() {}

    static void render(Context ctx, Store store, Project p, StoredLevel l, Form form, List<Cell> cells) {
        Grid grid = store.grids().find(p.id());
        Map<Cell, Bay> held = new HashMap<>();
        for (Bay b : store.bays().findByLevel(p.id(), l.id())) held.put(new Cell(b.col(), b.row()), b);
        UnitLabels units = UnitLabels.of(p.info().units());
        List<Line> lines = new ArrayList<>();
        int framed = 0;
        for (Cell c : cells) {
            if (c.col() >= grid.x().cells() || c.row() >= grid.y().cells()) continue;   // the store refuses these, naming them
            Bay b = held.get(c);
            if (b != null) framed++;
            lines.add(new Line(grid.bayName(c.col(), c.row()), b == null ? "nothing yet" : b.opening() ? "an opening"
                    : b.occupancy() + ", " + units.pressure(b.deadLoad()) + " dead"));
        }
        List<Field> fields = new ArrayList<>(List.of(new Field("version", form.value("version")), new Field("action", "clear"),
                new Field("confirm", "yes")));
        for (Cell c : cells) fields.add(new Field("cells", c.key()));
        for (String f : BayForm.FIELDS) fields.add(new Field(f, form.value(f)));
        Map<String, Object> m = new HashMap<>();
        m.put("project", p);
        m.put("level", l);
        m.put("lines", lines);
        m.put("framed", framed);
        m.put("fields", fields);
        m.put("back", "/projects/" + p.id() + "/levels/" + l.id() + "/bays" + BayForm.kept(form));
        ctx.render("bays/clear", m);
    }
}
