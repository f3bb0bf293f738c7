package com.baysheet.project;

/** A level as stored, with its id. */
public record StoredLevel(long id, long projectId, LevelInfo info) {
    public String name() { return info.name(); }
}
