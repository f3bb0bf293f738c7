package com.baysheet.framing;

import com.baysheet.engine.InputError;
import com.baysheet.engine.load.LineLoad;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridLineLoad;

/**
 * Puts a level's line loads on the grid-line members beneath them, one segment (grid point to grid point)
 * at a time. A line load never makes a member: where a segment carries no slab or beams there is none,
 * and the load is refused with the line, the bounding lines and the segment named.
 */
final class LineLoads {
    private LineLoads() {}

    static void place(LevelPlan plan, GridLineLoad l, Segment[][] alongX, Segment[][] alongY,
                      com.baysheet.engine.code.OccupancyCatalogue catalogue) {
        GridAxis own = l.onXLine() ? plan.grid.x() : plan.grid.y(), across = l.onXLine() ? plan.grid.y() : plan.grid.x();
        String field = "levels[" + plan.level.name() + "].lineLoads[" + l.label() + "]";
        if (l.line() >= own.lines()) throw new InputError(field + ".line", l.line(), "lies outside the grid (" + own.lines() + " lines)");
        if (l.to() >= across.lines()) throw new InputError(field + ".to", l.to(), "lies outside the grid (" + across.lines() + " lines)");
        if (l.liveOccupancy() != null && !catalogue.contains(l.liveOccupancy()))
            throw new InputError(field + ".liveOccupancy", l.liveOccupancy(), "is not in the occupancy catalogue");
        String line = own.name(l.line());
        for (int k = l.from(); k < l.to(); k++) {
            Segment s = l.onXLine() ? alongY[l.line()][k] : alongX[k][l.line()];
            if (!s.loaded())
                throw new InputError(field, l.label(), "line " + line + " from " + across.name(l.from()) + " to "
                        + across.name(l.to()) + ": no member at " + plan.level.name() + " along " + line + "/"
                        + across.name(k) + "-" + across.name(k + 1));
            s.lineLoads.add(new LineLoad(l.label(), 0, s.length, l.dead(), l.live(), l.liveOccupancy(), l.partitionWall()));
        }
    }
}
