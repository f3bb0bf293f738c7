package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Limits;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.StoredLevel;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

/**
 * Levels added above a typical, each the same as it ("and 8 more like it above"): the k-th is {@code k} storey heights
 * above the typical, named on from it ("Level 2" gives "Level 3", "Level 4", ...). One rule for the level's repeat
 * form, the add-a-level form and the table's repeat column; refusals name the field the person filled in.
 *
 * @param count        how many levels (1 to {@link Limits#MAX_LEVELS}, and within the project's cap)
 * @param storeyHeight ft or m, more than zero
 */
public record TypicalRepeat(int count, double storeyHeight, String countField, String heightField) {
    public TypicalRepeat {
        if (count < 1 || count > Limits.MAX_LEVELS)
            throw new InputError(countField, count, "must be 1 to " + Limits.MAX_LEVELS + " (limit levels)");
        if (!Double.isFinite(storeyHeight) || storeyHeight <= 0)
            throw new InputError(heightField, storeyHeight, "must be more than zero: the levels step up by it");
    }

    /** "8 more like it, 13 apart" for the audit entry. */
    String describe() {
        return count + " more like it above, " + Display.plain(storeyHeight) + " apart";
    }

    /** Adds the levels above {@code typicalId} and links them to it, in the caller's change. */
    List<StoredLevel> addAbove(Connection c, long projectId, long typicalId) throws SQLException {
        StoredLevel typical = TypicalRules.typical(c, projectId, typicalId);
        UnitSystem units = ProjectStore.find(c, projectId).info().units();
        List<StoredLevel> existing = LevelStore.findByProject(c, projectId);
        if (existing.size() + count > Limits.MAX_LEVELS)
            throw new InputError(countField, count, "would make " + (existing.size() + count) + " levels; a project may have at most "
                    + Limits.MAX_LEVELS + " (limit levels)");
        double top = typical.info().elevation() + count * storeyHeight;
        double cap = units == UnitSystem.US ? Limits.MAX_ELEVATION_FT : Limits.MAX_ELEVATION_M;
        if (top > cap)
            throw new InputError(heightField, storeyHeight, "puts the top level at " + Display.plain(top) + (units == UnitSystem.US ? " ft" : " m")
                    + ", above the highest elevation a level may have (" + Display.plain(cap) + ", limit elevation)");
        List<StoredLevel> added = new ArrayList<>();
        for (int k = 1; k <= count; k++) {
            LevelInfo info = new LevelInfo(TypicalRules.nameAbove(typical.name(), k), typical.info().elevation() + k * storeyHeight,
                    typical.info().roof(), typical.info().roofSlope(), typical.info().surface());
            for (StoredLevel o : existing) {
                if (o.name().equalsIgnoreCase(info.name()))
                    throw new InputError(countField, count, "would add " + info.name() + ", but the project has a level of that name already");
                if (o.info().elevation() == info.elevation())
                    throw new InputError(heightField, storeyHeight, "would put " + info.name() + " at " + Display.plain(info.elevation())
                            + ", the elevation of " + o.name());
            }
            StoredLevel l = LevelStore.insert(c, projectId, info);
            TypicalLevels.linkIn(c, projectId, typical.id(), l.id());
            added.add(new StoredLevel(l.id(), projectId, info, typical.id()));
        }
        return added;
    }
}
