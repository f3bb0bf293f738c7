package com.baysheet.web;

import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * The grid as a form: for each axis the line names and the spacings between them, each as a list
 * separated by spaces or commas ("1 2 3 4" and "30 30 25").
 */
final class GridForm {
    private GridForm() {}

    static Map<String, String> values(Grid g) {
        return Map.of("x.names", String.join(" ", g.x().names()), "x.spacings", spacings(g.x()),
                "y.names", String.join(" ", g.y().names()), "y.spacings", spacings(g.y()));
    }

    /** The grid the form describes; called inside {@link Form#attempt}, so the axes' own checks land on the form. */
    static Grid read(Form f) {
        return new Grid(axis(f, "x"), axis(f, "y"));
    }

    /** Checks each spacing is a number, naming the one that is not, before the axis checks the rest. */
    static void check(Form f) {
        for (String axis : List.of("x", "y")) {
            List<String> names = split(f.text(axis + ".names"));
            if (names.size() < 2) f.reject(axis + ".names", "give at least two grid line names");
            List<String> sp = split(f.text(axis + ".spacings"));
            for (int i = 0; i < sp.size(); i++)
                if (!Form.isDecimal(sp.get(i)))
                    f.reject(axis + ".spacings", "spacing " + (i + 1) + " must be a number (got \"" + sp.get(i) + "\")");
            if (sp.size() != Math.max(names.size() - 1, 1))
                f.reject(axis + ".spacings", "give one spacing between each pair of lines: " + (names.size() - 1)
                        + " for " + names.size() + " lines (got " + sp.size() + ")");
        }
    }

    private static GridAxis axis(Form f, String axis) {
        List<Double> spacings = new ArrayList<>();
        for (String s : split(f.text(axis + ".spacings"))) spacings.add(Double.parseDouble(s));
        return new GridAxis(axis, split(f.text(axis + ".names")), spacings);
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
