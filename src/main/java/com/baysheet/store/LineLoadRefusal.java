package com.baysheet.store;

import com.baysheet.engine.InputError;

/**
 * The derivation names a refused line load by its place in the building ("levels[L2].lineLoads[cladding].to");
 * the entry form and the API name their own fields, so a refusal of the load being entered is given the
 * field of the entry it concerns: the line for "no member beneath" and an unframed level.
 */
final class LineLoadRefusal {
    private LineLoadRefusal() {}

    static InputError asEntryField(InputError e, String label) {
        String f = e.field(), own = "lineLoads[" + label + "]";
        if (!f.contains(own)) return e;
        String rest = f.substring(f.indexOf(own) + own.length());
        String field = switch (rest) {
            case ".liveOccupancy" -> "liveOccupancy";
            case ".to" -> "to";
            default -> "line";
        };
        String problem = rest.equals(".level") ? "the level has no framed bays yet: frame the bays beneath the load first"
                : e.problem();
        return new InputError(field, e.value(), problem.replaceFirst(" \\(got .*\\)$", ""));
    }
}
