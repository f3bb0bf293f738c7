package com.baysheet.store;

import java.time.Instant;

/**
 * Something deleted and kept for {@link DeletedItems#KEPT}, restorable by the administrator.
 *
 * @param kind    level, bays, line load, point load or project
 * @param label   what was deleted, in the user's words ("Level 2 of 24-017 Alder Street offices")
 * @param members how many members went with it
 */
public record DeletedItem(long id, long projectId, String jobNumber, String kind, String label, int members,
                          String deletedBy, Instant deletedAt) {
    public static final String LEVEL = "level", BAYS = "bays", PROJECT = "project", LINE_LOAD = "line load", POINT_LOAD = "point load";

    private static final java.time.format.DateTimeFormatter SECONDS =
            java.time.format.DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'").withZone(java.time.ZoneOffset.UTC);

    /** When it was deleted, to the second, in UTC as the audit trail shows times. */
    public String when() { return SECONDS.format(deletedAt); }

    /** The last moment it can be restored. */
    public String keptUntil() { return SECONDS.format(deletedAt.plus(DeletedItems.KEPT)); }
}
