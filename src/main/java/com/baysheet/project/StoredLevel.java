package com.baysheet.project;

/**
 * A level as stored, with its id.
 *
 * @param typicalOf the id of the level whose bays this one has (a typical floor), or null where it has its own
 */
public record StoredLevel(long id, long projectId, LevelInfo info, Long typicalOf) {
    /** A level with bays of its own. */
    public StoredLevel(long id, long projectId, LevelInfo info) {
        this(id, projectId, info, null);
    }

    public String name() { return info.name(); }

    /** Whether this level's bays are another level's. */
    public boolean linked() { return typicalOf != null; }
}
