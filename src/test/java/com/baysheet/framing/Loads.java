package com.baysheet.framing;

import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.Step;

import java.util.LinkedHashMap;
import java.util.Map;

import static com.baysheet.framing.Buildings.US;

/** Reading loads back out of derived members and records, for the framing tests. */
final class Loads {
    private Loads() {}

    static Occupancy use(String id) { return US.catalogue().get(id); }

    static double l0(String id) { return use(id).uniform(US.system()); }

    static boolean isRoof(String id) { return use(id).isRoof(); }

    /** The tributary areas a member's record lists as inputs ("A[office]" and so on), by occupancy id. */
    static Map<String, Double> recordAreas(CalcRecord r) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (Entry e : r.inputs())
            if (e.key().startsWith("A[")) out.put(e.key().substring(2, e.key().length() - 1), e.value());
        return out;
    }

    /** Σ L0 × A over the floor (not roof) occupancies of an area map. */
    static double floorLive(Map<String, Double> areas) {
        double s = 0;
        for (var e : areas.entrySet()) if (!isRoof(e.getKey())) s += l0(e.getKey()) * e.getValue();
        return s;
    }

    /** Σ L0 × A over the roof occupancies of an area map. */
    static double roofLive(Map<String, Double> areas) {
        double s = 0;
        for (var e : areas.entrySet()) if (isRoof(e.getKey())) s += l0(e.getKey()) * e.getValue();
        return s;
    }

    static double roofArea(Map<String, Double> areas) {
        double s = 0;
        for (var e : areas.entrySet()) if (isRoof(e.getKey())) s += e.getValue();
        return s;
    }

    static double floorArea(Map<String, Double> areas) {
        double s = 0;
        for (var e : areas.entrySet()) if (!isRoof(e.getKey())) s += e.getValue();
        return s;
    }

    /**
     * The lowest reduction factor ASCE 7-16 4.7 allows on an occupancy's live load for a member supporting
     * {@code floors} floors: 4.7.2 limits 0.50 (one floor) and 0.40 (two or more); 4.7.3 and 4.7.4 heavy loads
     * and garages unreduced on one floor, at most 20 % off on two or more; 4.7.5 assembly unreduced.
     */
    static double lowestFactor(String id, int floors) {
        ReductionRule rule = use(id).rule();
        if (rule == ReductionRule.ORDINARY && l0(id) > 100) rule = ReductionRule.HEAVY;
        return switch (rule) {
            case ORDINARY -> floors >= 2 ? 0.4 : 0.5;
            case HEAVY, GARAGE -> floors >= 2 ? 0.8 : 1.0;
            case NOT_REDUCIBLE, ROOF -> 1.0;
        };
    }

    /** Whether an occupancy's live load may be reduced on a member over {@code floors} floors (ASCE 7-16 4.7.2 to 4.7.5). */
    static boolean reducible(String id, int floors) {
        if (isRoof(id)) return false;
        return lowestFactor(id, floors) < 1;
    }

    /**
     * ASCE 7-16 4.7.2, Eq. 4.7-1 (US): the factor from an influence area K_LL·A_T in ft²: 1 below 400 ft², else
     * 0.25 + 15/√(K_LL·A_T), at most 1 and not below 0.50 (one floor) or 0.40 (two or more).
     */
    static double basicFactor(double influence, int floors) {
        if (influence < 400) return 1;
        return Math.max(floors == 1 ? 0.5 : 0.4, Math.min(1, 0.25 + 15 / Math.sqrt(influence)));
    }

    static boolean hasStep(CalcRecord r, String symbol) {
        for (Step s : r.steps()) if (s.symbol().equals(symbol)) return true;
        return false;
    }

    /** ASCE 7-16 2.3.1 Exception 1: 0.5 L in combination 3 where every floor L0 is at most 100 psf, no garage or assembly. */
    static boolean halfLAllowed(Map<String, Double> areas) {
        boolean anyFloor = false;
        for (String id : areas.keySet()) {
            if (isRoof(id)) continue;
            anyFloor = true;
            Occupancy o = use(id);
            if (l0(id) > 100 || o.rule() == ReductionRule.GARAGE || o.assembly()) return false;
        }
        return anyFloor;
    }

    /** The ASCE 7-16 2.3.1 gravity combinations of D, L, Lr, by the names the engine prints. */
    static Map<String, Double> lrfd(double d, double l, double lr, boolean halfL) {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put("LRFD 1", 1.4 * d);
        m.put("LRFD 2", 1.2 * d + 1.6 * l + 0.5 * lr);
        m.put("LRFD 3", 1.2 * d + (halfL ? 0.5 : 1.0) * l + 1.6 * lr);
        return m;
    }

    /** The ASCE 7-16 2.4.1 gravity combinations of D, L, Lr. */
    static Map<String, Double> asd(double d, double l, double lr) {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put("ASD 1", d);
        m.put("ASD 2", d + l);
        m.put("ASD 3", d + lr);
        m.put("ASD 4", d + 0.75 * l + 0.75 * lr);
        return m;
    }

    static double max(Map<String, Double> m) {
        return m.values().stream().mapToDouble(Double::doubleValue).max().orElseThrow();
    }
}
