package com.baysheet.framing.model;

import com.baysheet.engine.Check;

import java.util.Map;
import java.util.TreeMap;

/**
 * Each member's own weight per length, as a dead load: by role (infill beams, grid beams (grid-line members
 * carrying slab only), girders and columns), in plf or kN/m, and for any member where the engineer entered its
 * own (a heavier section, a transfer girder) that value instead. A column's weight over the storey below each
 * level is added to the take-down there.
 *
 * @param origin  where the role figures come from, printed beside each ("firm default"); 0 everywhere is allowed
 *                and stated on every sheet as "self weight not included (0)"
 * @param members weights entered for single members, by derived member id (stable while its grid lines stay)
 */
public record SelfWeights(double infillBeam, double gridBeam, double girder, double column, String origin,
                          Map<String, Double> members) {
    /** Nothing set: every sheet says self weight is not included. */
    public static final SelfWeights NONE = new SelfWeights(0, 0, 0, 0, "none set in the firm's settings");

    /** What a member's record prints where its weight was entered for it rather than taken from its role. */
    public static final String ENTERED = "entered for this member";

    public SelfWeights {
        Check.nonNegative("selfWeight.infillBeam", infillBeam);
        Check.nonNegative("selfWeight.gridBeam", gridBeam);
        Check.nonNegative("selfWeight.girder", girder);
        Check.nonNegative("selfWeight.column", column);
        origin = Check.text("selfWeight.origin", origin).strip();
        members.forEach((id, w) -> Check.nonNegative("selfWeight." + id, w));
        members = Map.copyOf(new TreeMap<>(members));
    }

    /** By role only. */
    public SelfWeights(double infillBeam, double gridBeam, double girder, double column, String origin) {
        this(infillBeam, gridBeam, girder, column, origin, Map.of());
    }

    /** These weights with the members' own values given (replacing any before). */
    public SelfWeights withMembers(Map<String, Double> own) {
        return new SelfWeights(infillBeam, gridBeam, girder, column, origin, own);
    }

    /** The weight per length the member carries: its own where one was entered, else its role's. */
    public double of(String memberId, double roleWeight) {
        Double own = members.get(memberId);
        return own == null ? roleWeight : own;
    }

    /** Where that weight comes from, as the record prints it ("firm default for girders", "entered for this member"). */
    public String originOf(String memberId, String role) {
        return members.containsKey(memberId) ? ENTERED : origin + " for " + role;
    }

    /** No weight at all: every role 0 and none entered for a member. */
    public boolean none() { return infillBeam == 0 && gridBeam == 0 && girder == 0 && column == 0 && members.isEmpty(); }
}
