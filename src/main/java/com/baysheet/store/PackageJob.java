package com.baysheet.store;

import java.time.Instant;

/**
 * A package checking copy asked for, as the job table holds it (its PDF aside, read by {@link PackageJobStore#pdf}).
 *
 * @param level    the package's scope: blank for the whole project, else the level's name
 * @param done     member sheets rendered so far of {@code total}
 * @param error    why it failed (null unless failed)
 * @param sha256   of the rendered PDF (null until done)
 * @param finished when it ended (null while queued or running)
 */
public record PackageJob(long id, long project, String level, String title, String fileName, String requestedBy,
                         State state, int attempts, int done, int total, String error, String sha256, Instant created,
                         Instant finished) {

    /** Where a job stands; the last three are final. */
    public enum State {
        QUEUED, RUNNING, DONE, FAILED, CANCELLED;

        /** As the state column holds it. */
        public String column() { return name().toLowerCase(); }

        public boolean finished() { return this == DONE || this == FAILED || this == CANCELLED; }

        static State of(String column) { return valueOf(column.toUpperCase()); }
    }

    /** What a new job asks for: the scope, the names it is shown and downloaded by, who asked, the sheets it will render. */
    public record Request(long project, String level, String title, String fileName, String requestedBy, int total) {
        public Request {
            level = level == null ? "" : level;
            if (total < 0) throw new IllegalArgumentException("total: at least 0 member sheets, not " + total);
        }
    }
}
