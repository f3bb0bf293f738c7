package com.baysheet.framing;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.RoofSurface;
import com.baysheet.framing.model.SelfWeights;

import java.util.List;

/**
 * Typical floors: a level framed exactly as an earlier level of the same derivation was, but for its name and id.
 * A level's framing reads of the level its bays, whether it is a roof, its slope and surface and whether another level
 * is higher; its name only in its members' ids, their level and their records' subjects. Where neither level has a
 * line load, a point load, a self weight entered for one of its members, a roof step or a bay open to the sky (each
 * of which names the level or reads beyond it), two levels of equal {@link Shape} frame into the same members with
 * the same end shares, so the second takes the first's members under its own ids and names, each result the same
 * neutral result under the member's own subject, and its end shares as they are. Nothing is recalculated or
 * approximated: it is what framing the level again would give, found without building and comparing every input.
 */
final class TypicalFloor {
    private TypicalFloor() {}

    /** What a level's framing reads of the level, apart from its name. */
    record Shape(List<Bay> bays, boolean roof, double roofSlope, RoofSurface surface, boolean belowAnother) {
        static Shape of(LevelPlan p) {
            return new Shape(p.level.bays(), p.level.roof(), p.level.roofSlope(), p.level.surface(), p.belowAnother);
        }
    }

    /** Whether a level's framing reads nothing but its {@link Shape} and its name (see above). */
    static boolean plain(LevelPlan p, boolean loaded, RoofSteps steps, SkyExposure.Open open, SelfWeights weights) {
        if (loaded || !steps.isEmpty() || !open.bays().isEmpty()) return false;
        String prefix = p.id + "-";
        for (String id : weights.members().keySet()) if (id.startsWith(prefix)) return false;
        return true;
    }

    /** {@code typical}, framed for {@code from}, as framing {@code to} (a plain level of the same shape) gives it. */
    static LevelFraming as(LevelFraming typical, LevelPlan from, LevelPlan to) {
        LevelFraming f = new LevelFraming(to, typical.atPoint);
        String level = to.level.name();
        int cut = from.id.length();
        for (int n = 0; n < typical.members.size(); n++) {
            DerivedMember m = typical.members.get(n);
            var neutral = typical.neutrals.get(n);
            f.members.add(new DerivedMember(to.id + m.id().substring(cut), m.name(), level, m.role(), m.kind(), m.plan(), m.span(),
                    m.tributaryWidth(), m.areas(), m.directArea(), m.bays(), m.tributary(), neutral.withSubject(m.name() + ", " + level)));
            f.neutrals.add(neutral);
        }
        return f;
    }
}
