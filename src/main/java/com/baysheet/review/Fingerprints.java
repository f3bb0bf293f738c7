package com.baysheet.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.RecordParts;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * {@link CalcFingerprint}s kept from one model write to the next. A calculation that an edit leaves alone is the same
 * record object's parts in the next derivation (the framing keeps each calculation's result, and a member's record
 * shares its lists with it), so its fingerprint is looked up by those parts as objects ({@link RecordParts}), never written and
 * hashed again: one bay edited in a building of thousands of typical members fingerprints the few it changed. Records are
 * immutable, so the same parts are the same record. Holds, for each of the last few projects written, what its last
 * write asked for, no more.
 */
public final class Fingerprints {
    /** Enough for the projects a small office edits at once, as many as the derived buildings kept. */
    private static final int PROJECTS = 16;

    /** A record by its subject and its other parts as objects. */
    private record Key(String subject, RecordParts parts) {}

    /** One project's fingerprints: those its last write asked for, and those of the write under way. */
    private static final class Kept {
        Map<Key, String> earlier = new HashMap<>();
        Map<Key, String> now = new HashMap<>();
    }

    private final Map<Long, Kept> projects = new LinkedHashMap<>(PROJECTS, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<Long, Kept> eldest) { return size() > PROJECTS; }
    };

    /** The fingerprint of {@code record}, a calculation of project {@code projectId}, as {@link CalcFingerprint#of} gives it. */
    public synchronized String of(long projectId, CalcRecord record) {
        Kept kept = projects.computeIfAbsent(projectId, p -> new Kept());
        Key k = new Key(record.subject(), new RecordParts(record));
        String f = kept.now.get(k);
        if (f == null) {
            f = kept.earlier.get(k);
            if (f == null) f = CalcFingerprint.of(record);
            kept.now.put(k, f);
        }
        return f;
    }

    /** Ends a write of the project: what it asked for is kept for the next one, and what it did not ask for goes. */
    public synchronized void turn(long projectId) {
        Kept kept = projects.get(projectId);
        if (kept == null) return;
        kept.earlier = kept.now;
        kept.now = new HashMap<>();
    }
}
