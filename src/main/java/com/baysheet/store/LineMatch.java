package com.baysheet.store;

import com.baysheet.framing.model.GridAxis;

import java.util.ArrayList;
import java.util.List;

/**
 * Which saved line each line of a requested axis is, since a grid arrives (from the form or the API) as
 * names and spacings only. With as many lines as before, the lines are the same ones in the same places:
 * renamed or moved, never inserted or removed. With a different number, a line is the saved line of the
 * same name, matched in order (the longest run of names common to both, in order): the other requested
 * lines are inserted, the other saved lines removed. So renaming and inserting are two saves.
 */
final class LineMatch {
    /** Marks a requested line that is new, to get a fresh id. */
    static final int NEW = -1;

    private LineMatch() {}

    /** For each requested line, the saved line's id, or {@link #NEW}. */
    static List<Integer> ids(GridAxis saved, GridAxis requested) {
        if (saved.lines() == requested.lines()) return saved.ids();
        List<String> a = saved.names(), b = requested.names();
        int[][] common = new int[a.size() + 1][b.size() + 1];
        for (int i = a.size() - 1; i >= 0; i--)
            for (int j = b.size() - 1; j >= 0; j--)
                common[i][j] = a.get(i).equals(b.get(j)) ? common[i + 1][j + 1] + 1 : Math.max(common[i + 1][j], common[i][j + 1]);
        List<Integer> out = new ArrayList<>();
        int i = 0, j = 0;
        while (j < b.size()) {
            if (i < a.size() && a.get(i).equals(b.get(j))) {
                out.add(saved.id(i));
                i++;
                j++;
            } else if (i < a.size() && common[i + 1][j] >= common[i][j + 1]) {
                i++;
            } else {
                out.add(NEW);
                j++;
            }
        }
        return out;
    }
}
