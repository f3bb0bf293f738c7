package com.baysheet.framing.model;

import com.baysheet.engine.InputError;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Named grid lines in one direction, in order, with the spacing between each line and the next
 * (ft or m). Unequal spacings are allowed. Each line has an id that stays with it while lines are
 * inserted, removed or renamed around it (the store keeps them; a model built without them numbers its
 * lines by position); member ids are made of line ids, names are only labels.
 *
 * @param axis "x" (lines placed along x, usually numbered) or "y" (usually lettered), for messages
 * @param ids  one id per line, distinct, 0 or more
 */
public record GridAxis(String axis, List<String> names, List<Double> spacings, List<Integer> ids) {
    /** An axis whose lines are identified by their position (0, 1, ...). */
    public GridAxis(String axis, List<String> names, List<Double> spacings) {
        this(axis, names, spacings, positions(names == null ? 0 : names.size()));
    }

    public GridAxis {
        // counted before anything else looks at the lines: matching a changed grid is quadratic in its lines
        Limits.count("grid." + axis + ".names", names.size(), Limits.MAX_GRID_LINES, "grid lines along " + axis);
        names = List.copyOf(names);
        spacings = List.copyOf(spacings);
        ids = List.copyOf(ids);
        if (ids.size() != names.size())
            throw new InputError("grid." + axis + ".ids", ids.size(), "must give one id per grid line (" + names.size() + ")");
        if (ids.stream().anyMatch(i -> i < 0) || new HashSet<>(ids).size() != ids.size())
            throw new InputError("grid." + axis + ".ids", ids, "grid line ids must be distinct and 0 or more");
        if (names.size() < 2) throw new InputError("grid." + axis, names.size(), "needs at least two grid lines");
        if (spacings.size() != names.size() - 1)
            throw new InputError("grid." + axis + ".spacings", spacings.size(), "must give one spacing between each pair of lines (" + (names.size() - 1) + ")");
        Set<String> seen = new HashSet<>();
        for (String n : names) {
            if (n == null || n.isBlank()) throw new InputError("grid." + axis + ".names", "\"\"", "a grid line needs a name");
            if (n.length() > Limits.MAX_LINE_NAME)
                throw new InputError("grid." + axis + ".names", n.length() + " characters", "a grid line name must be at most " + Limits.MAX_LINE_NAME + " characters");
            if (!seen.add(n)) throw new InputError("grid." + axis + ".names", n, "grid line named twice");
        }
        for (int i = 0; i < spacings.size(); i++) {
            double s = spacings.get(i);
            if (!Double.isFinite(s) || s <= 0)
                throw new InputError("grid." + axis + ".spacings[" + names.get(i) + "-" + names.get(i + 1) + "]", s,
                        "spacing must be a finite number greater than 0");
        }
    }

    /** Builds an axis from line positions, which must rise strictly. */
    public static GridAxis ofPositions(String axis, List<String> names, List<Double> positions) {
        List<Double> s = new ArrayList<>();
        for (int i = 1; i < positions.size(); i++) {
            double d = positions.get(i) - positions.get(i - 1);
            if (!(d > 0)) throw new InputError("grid." + axis + ".positions[" + names.get(i) + "]", positions.get(i),
                    "grid lines must be in order, each past the one before (" + positions.get(i - 1) + ")");
            s.add(d);
        }
        return new GridAxis(axis, names, s);
    }

    /** The same lines, names and spacings with these ids. */
    public GridAxis withIds(List<Integer> lineIds) {
        return new GridAxis(axis, names, spacings, lineIds);
    }

    public int lines() { return names.size(); }

    /** The stable id of the line at this position. */
    public int id(int line) { return ids.get(line); }

    /** The position of the line with this id, or -1. */
    public int indexOf(int lineId) { return ids.indexOf(lineId); }

    public int cells() { return names.size() - 1; }

    public double position(int line) {
        double p = 0;
        for (int i = 0; i < line; i++) p += spacings.get(i);
        return p;
    }

    public double spacing(int cell) { return spacings.get(cell); }

    public double extent() { return position(lines() - 1); }

    public String name(int line) { return names.get(line); }

    private static List<Integer> positions(int n) {
        List<Integer> p = new ArrayList<>();
        for (int i = 0; i < n; i++) p.add(i);
        return p;
    }
}
