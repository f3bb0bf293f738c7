package com.baysheet.web;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Side;
import com.baysheet.project.Cell;

import java.util.ArrayList;
import java.util.Base64;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * After an Apply that gave a cantilever to several bays, which of the ticked bays got it (those on that building edge)
 * and which did not. The redirect carries the ticked cells as a bitmap over the grid ({@code applied=COLSxROWS-BITS}, a
 * whole level of the largest grid in under 2 kB); the page reads what the bays hold now, so the lines are true of the
 * model even on a reload, and an address made up by hand shows only bay names of this grid.
 */
final class CantileverReport {
    static final String PARAM = "applied";

    private CantileverReport() {}

    /** The query parameter for these ticked cells ("" where the apply gave no cantilever or ticked one bay). */
    static String param(Form f, List<Cell> cells, Grid g) {
        boolean any = BayForm.SIDES.stream().anyMatch(s -> !f.value("cantilevers." + s).isBlank());
        if (!any || cells.size() < 2) return "";
        BitSet bits = new BitSet();
        for (Cell c : cells) if (c.col() < g.x().cells() && c.row() < g.y().cells()) bits.set(c.row() * g.x().cells() + c.col());
        return "&" + PARAM + "=" + g.x().cells() + "x" + g.y().cells() + "-" + Base64.getUrlEncoder().withoutPadding().encodeToString(bits.toByteArray());
    }

    /** The report's lines for the page: one or two per side whose cantilever the form keeps. */
    static List<String> lines(String applied, Map<String, String> kept, Grid g, List<Bay> bays, UnitLabels units) {
        List<String> out = new ArrayList<>();
        Optional<List<Cell>> cells = decode(applied, g);
        if (cells.isEmpty()) return out;
        Map<String, Bay> held = new HashMap<>();
        for (Bay b : bays) held.put(b.col() + "," + b.row(), b);
        for (String s : BayForm.SIDES) {
            if (kept.getOrDefault("cantilevers." + s, "").isBlank()) continue;
            Side side = Side.valueOf(s.toUpperCase());
            List<String> given = new ArrayList<>(), not = new ArrayList<>();
            Double length = null;
            for (Cell c : cells.get()) {
                Bay b = held.get(c.key());
                if (b == null || b.opening()) continue;
                Double len = b.cantilevers().get(side);
                if (len != null) length = len;
                (len != null ? given : not).add(g.bayName(c.col(), c.row()));
            }
            if (given.isEmpty()) continue;
            out.add("Cantilever slab past the " + s + " edge (" + units.length(length) + ") given to " + given.size()
                    + (given.size() == 1 ? " bay: " : " bays on that edge: ") + String.join(", ", given) + ".");
            if (!not.isEmpty()) out.add("Not given to " + not.size() + (not.size() == 1 ? " bay" : " bays")
                    + ", not on that edge (a bay or an opening lies beyond them to the " + s + "; they got the rest of what was applied): "
                    + String.join(", ", not) + ".");
        }
        return out;
    }

    private static Optional<List<Cell>> decode(String applied, Grid g) {
        if (applied == null) return Optional.empty();
        String size = g.x().cells() + "x" + g.y().cells() + "-";
        // a grid changed since the apply (or an address made by hand) gives no report rather than a wrong one
        if (!applied.startsWith(size)) return Optional.empty();
        BitSet bits;
        try {
            bits = BitSet.valueOf(Base64.getUrlDecoder().decode(applied.substring(size.length())));
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
        List<Cell> out = new ArrayList<>();
        int n = g.x().cells() * g.y().cells();
        for (int i = bits.nextSetBit(0); i >= 0 && i < n; i = bits.nextSetBit(i + 1)) out.add(new Cell(i % g.x().cells(), i / g.x().cells()));
        return Optional.of(out);
    }
}
