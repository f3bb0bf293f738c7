package com.baysheet.framing;

import com.baysheet.engine.member.EndShare;
import com.baysheet.engine.member.MemberResult;

import java.util.List;

/**
 * One storey of a column stack as {@link ColumnTakeDown#stack} takes it down, kept so that a stack whose storeys so
 * far are those of a stack already taken down reads its column's result and take-down row instead of building the
 * column's input again. The input of a storey's column (its cumulative load, floors supported, slope, open bays) is
 * a function of the storeys above it and what the stack reads at this level, so a storey is known by the storey
 * above it ({@code above}, compared by identity: one object per distinct storey) and by everything read here. In a
 * tall building of repeated floors this turns the take-down's comparison of whole inputs, each listing every floor
 * above, into one small comparison per storey: a stack is taken down in time linear in its levels.
 */
final class ColumnStorey {
    /** The column's result under the cache's neutral subject. */
    final MemberResult neutral;
    /** The storey's take-down row, with the first stack's column id. */
    final TakeDown.Row row;

    ColumnStorey(MemberResult neutral, TakeDown.Row row) {
        this.neutral = neutral;
        this.row = row;
    }

    /**
     * What one level adds to a stack: the storey above (null at the stack's first storey), the end shares arriving
     * (null: none), the level's roof slope and name, the column's place where bays frame around it (null: none, the
     * place above holds), the open bays it adds, the self weight per length with its origin, and the column height.
     */
    record Key(ColumnStorey above, List<EndShare> shares, double roofSlope, String level, ColumnClass place, boolean cantilever,
               List<String> openHere, double perLength, String origin, double height) {}

    /** The row of this storey for another stack's column {@code member}. */
    TakeDown.Row rowOf(String member) {
        TakeDown.Row r = row;
        return new TakeDown.Row(r.level(), member, r.areaAtLevel(), r.cumulativeArea(), r.reducibleArea(), r.kll(), r.influenceArea(),
                r.floorsSupported(), r.factor(), r.deadAtLevel(), r.selfWeightAtLevel(), r.dead(), r.liveUnreduced(), r.liveReduced(),
                r.roofLive(), r.snow(), r.lrfd(), r.lrfdCombination(), r.asd(), r.asdCombination());
    }
}
