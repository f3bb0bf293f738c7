package com.baysheet.store;

/**
 * A point load as stored, its lines named as the grid names them now (they follow the lines' stable ids).
 *
 * @param where    "bay A-B/1-2" or "line 2, A-C" in the trade's form
 * @param x        in a bay: from the bay's west side (NaN on a member)
 * @param y        in a bay: from the bay's south side (NaN on a member)
 * @param distance on a member: from the {@code from} line of {@code where} (NaN in a bay)
 */
public record StoredPointLoad(long id, long levelId, String label, boolean inBay, String where, double x, double y,
                              double distance, double dead, double live, String liveOccupancy) {}
