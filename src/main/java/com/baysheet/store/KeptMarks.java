package com.baysheet.store;

import com.baysheet.store.review.MarkWrites;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * What each project's last model write left its marks as ({@link MarkWrites.Kept}), under the project's versions as that
 * write committed them. Mark rows change only in a model write (which claims the next model version), a firm-wide
 * change (the firm's catalogue or settings version) or a rename (the marks version), so a write that finds the
 * project still at exactly those versions finds the rows as kept and starts from them; any other write, on this
 * server or another over the same database, moves a version and the rows are read again. Held for as many projects
 * as the derived buildings.
 */
final class KeptMarks {
    private static final int PROJECTS = 16;

    record Entry(ProjectVersions.Version version, MarkWrites.Kept marks) {}

    private final Map<Long, Entry> projects = new LinkedHashMap<>(PROJECTS, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<Long, Entry> eldest) { return size() > PROJECTS; }
    };

    /** How many writes have started from kept marks, for tests. */
    private long starts;

    /** The marks kept for the project if it stands at exactly the versions they were kept at, else null. */
    synchronized MarkWrites.Kept at(long projectId, ProjectVersions.Version now) {
        Entry e = projects.get(projectId);
        if (e == null || !e.version().equals(now)) return null;
        starts++;
        return e.marks();
    }

    synchronized long starts() { return starts; }

    /** Keeps what a committed write left the project's marks as. */
    synchronized void put(long projectId, Entry e) {
        if (e != null) projects.put(projectId, e);
    }
}
