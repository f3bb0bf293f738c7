package com.baysheet.web;

import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.web.entry.LengthField;

import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

/**
 * The grid as a form: for each axis the line names and the spacings between them, each as a list
 * separated by spaces or commas ("1 2 3 4" and "30 30 25" or "25'-6\" 30' 24'-6 1/2\"").
 */
final class GridForm {
    private GridForm() {}

    static Map<String, String> values(Grid g) {
        return Map.of("x.names", String.join(" ", g.x().names()), "x.spacings", spacings(g.x()),
                "y.names", String.join(" ", g.y().names()), "y.spacings", spacings(g.y()));
    }

    /**
     * Reads both axes, recording every error on the form at once (names, spacings as lengths, their counts);
     * the grid is built by the supplier, inside {@link Form#attempt}, so the axes' own checks land there too.
     */
    static Supplier<Grid> read(Form f, UnitSystem units) {
        Map<String, List<String>> names = new HashMap<>();
        Map<String, List<Double>> spacings = new HashMap<>();
        for (String axis : List.of("x", "y")) {
            List<String> lines = split(f.text(axis + ".names"));
            if (lines.size() < 2) f.reject(axis + ".names", "give at least two grid line names");
            else f.check(axis + ".names", () -> new GridAxis(axis, lines, Collections.nCopies(lines.size() - 1, 1.0)));
            String field = axis + ".spacings";
            List<Double> sp = f.lengths(field, LengthField.span("Spacings along " + axis), units);
            if (!f.hasError(field) && sp.size() != Math.max(lines.size() - 1, 1))
                f.reject(field, "give one spacing between each pair of lines: " + (lines.size() - 1)
                        + " for " + lines.size() + " lines (got " + sp.size() + ")");
            names.put(axis, lines);
            spacings.put(axis, sp);
        }
        return () -> new Grid(new GridAxis("x", names.get("x"), spacings.get("x")),
                new GridAxis("y", names.get("y"), spacings.get("y")));
    }

    private static List<String> split(String text) {
        return text.isBlank() ? List.of() : Arrays.asList(text.strip().split("[\\s,;]+"));
    }

    private static String spacings(GridAxis a) {
        StringBuilder b = new StringBuilder();
        for (double s : a.spacings()) b.append(b.length() == 0 ? "" : " ").append(com.baysheet.engine.units.Display.plain(s));
        return b.toString();
    }
}
