package com.baysheet.web;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Limits;
import com.baysheet.framing.model.Side;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The bay editor's form: the selected cells (checkboxes "col,row"), then what they get: an occupancy,
 * dead load, framing direction and number of infill beams, cantilever lengths by side (blank for none) and
 * the cantilever slabs' occupancy (blank for the default, the balcony serving the bay's occupancy).
 */
final class BayForm {
    static final List<String> SIDES = List.of("north", "south", "east", "west");

    /** The fields an Apply keeps for the next one. */
    static final List<String> FIELDS = List.of("occupancy", "deadLoad", "beams", "infillBeams", "cantilevers.north",
            "cantilevers.south", "cantilevers.east", "cantilevers.west", "cantileverOccupancy");

    private BayForm() {}

    /** "?occupancy=office&deadLoad=65...": the applied values, for the page after the redirect. */
    static String kept(Form f) {
        StringBuilder q = new StringBuilder();
        for (String field : FIELDS) {
            q.append(q.length() == 0 ? "?" : "&").append(java.net.URLEncoder.encode(field, java.nio.charset.StandardCharsets.UTF_8))
                    .append('=').append(java.net.URLEncoder.encode(f.value(field), java.nio.charset.StandardCharsets.UTF_8));
        }
        return q.toString();
    }

    /** The values of an existing bay, to start the form from when one bay is being edited. */
    static Map<String, String> values(Bay b) {
        Map<String, String> v = new java.util.HashMap<>();
        if (b.opening()) return v;
        v.put("occupancy", b.occupancy());
        v.put("deadLoad", com.baysheet.engine.units.Display.plain(b.deadLoad()));
        v.put("beams", b.framing().beams().name());
        v.put("infillBeams", String.valueOf(b.framing().infillBeams()));
        b.cantilevers().forEach((s, len) -> v.put("cantilevers." + s.name().toLowerCase(), com.baysheet.engine.units.Display.plain(len)));
        v.put("cantileverOccupancy", b.cantileverOccupancy() == null ? "" : b.cantileverOccupancy());
        return v;
    }

    static List<Cell> cells(Form f) {
        List<Cell> cells = new ArrayList<>();
        if (f.values("cells").size() > Limits.MAX_CELLS_PER_REQUEST) {
            f.reject("cells", "select at most " + Limits.MAX_CELLS_PER_REQUEST + " bays at once (limit cells)");
            return cells;
        }
        for (String key : f.values("cells")) {
            try {
                cells.add(Cell.parse(key));
            } catch (com.baysheet.engine.InputError e) {
                f.reject("cells", e.problem());
            }
        }
        if (cells.isEmpty()) f.reject("cells", "select at least one bay");
        return cells;
    }

    /** Reads the numbers, recording errors; the assignment is built later, inside {@link Form#attempt}. */
    static Values read(Form f, com.baysheet.engine.units.UnitSystem units) {
        double deadLoad = f.number("deadLoad");
        int infill = f.integer("infillBeams");
        Map<Side, Double> cantilevers = new EnumMap<>(Side.class);
        for (String s : SIDES) {
            double len = f.optionalLength("cantilevers." + s,
                    com.baysheet.web.entry.LengthField.span("Cantilever past the " + s + " edge"), units);
            if (!Double.isNaN(len)) cantilevers.put(Side.valueOf(s.toUpperCase()), len);
        }
        String beams = f.text("beams");
        if (!beams.equals("X") && !beams.equals("Y")) f.reject("beams", "choose the direction the infill beams span");
        String cantileverUse = f.text("cantileverOccupancy");
        return new Values(f.text("occupancy"), deadLoad, beams, infill, cantilevers, cantileverUse.isEmpty() ? null : cantileverUse);
    }

    record Values(String occupancy, double deadLoad, String beams, int infillBeams, Map<Side, Double> cantilevers,
                  String cantileverOccupancy) {
        BayAssignment assignment(List<Cell> cells) {
            return new BayAssignment(cells, false, occupancy, deadLoad,
                    new Framing(Direction.valueOf(beams), infillBeams), cantilevers, cantileverOccupancy).cantileversOnEdges();
        }
    }
}
