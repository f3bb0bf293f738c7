package com.baysheet.store;

import com.baysheet.project.Model;
import com.baysheet.review.MarkSheets;
import com.baysheet.store.review.MarkBook;

/**
 * Every version a page of a project's results (members, take-downs, the framing plan) is rendered from, read
 * from the database on each request, so that several servers over one database agree on it: the project's
 * version (every model write bumps it), the firm's catalogue and settings versions (firm occupancies and self
 * weights load every project), and the fingerprint of the project's stored marks (a rename changes a mark's
 * text and no version). A page kept under a {@link Version} is exactly the page of that state.
 */
public final class ProjectVersions {
    /** A read of the marks races a concurrent save at most this often before the page is rendered and not kept. */
    private static final int READ_ATTEMPTS = 3;

    /** What a result page of the project is a function of, besides its address and the viewer. */
    public record Version(long project, long model, long catalogue, long firm, String marks) {}

    /**
     * A project's results and marks, and the version they are exactly of; {@code version} is null when a save
     * raced the read (the page is right to render, not to keep).
     */
    public record State(Results.Computed computed, MarkSheets marks, Version version) {}

    private final Sql sql;
    private final Results results;

    ProjectVersions(Sql sql, Results results) {
        this.sql = sql;
        this.results = results;
    }

    /** The versions as they stand: four small reads in one transaction; not found when there is no such project. */
    public Version of(long projectId) {
        return sql.tx(c -> new Version(projectId, Results.modelVersion(c, projectId), OccupancyStore.catalogueVersion(c),
                Results.firmVersion(c), MarkBook.fingerprint(c, projectId)));
    }

    /** The results and marks to render a page from, with the version they are exactly of when no save raced them. */
    public State state(long projectId) {
        for (int attempt = 1; ; attempt++) {
            Results.Computed computed = results.of(projectId);
            Model m = computed.model();
            State s = sql.tx(c -> {
                // which member carries which mark is written with the version: the same version before and after
                // the marks are read means they are the marks of this model
                long before = Results.modelVersion(c, projectId);
                MarkBook.Read marks = MarkBook.fingerprinted(c, projectId, computed.derived());
                long after = Results.modelVersion(c, projectId);
                boolean exact = before == m.project().version() && after == before && results.kept(computed);
                return new State(computed, marks.sheets(), !exact ? null
                        : new Version(projectId, m.project().version(), m.catalogueVersion(), m.firmVersion(), marks.fingerprint()));
            });
            if (s.version() != null || attempt == READ_ATTEMPTS) return s;
        }
    }
}
