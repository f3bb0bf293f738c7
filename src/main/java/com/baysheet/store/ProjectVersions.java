package com.baysheet.store;

import com.baysheet.project.Model;
import com.baysheet.review.MarkSheets;
import com.baysheet.store.review.MarkBook;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;

/**
 * Every version a page of a project's results (members, take-downs, the framing plan) is rendered from, read
 * from the database on each request, so that several servers over one database agree on it: the project's
 * version (every model write bumps it), the firm's catalogue and settings versions (firm occupancies and self
 * weights load every project), and the count of the project's mark renames (a rename changes a mark's text and
 * no model version). A page kept under a {@link Version} is exactly the page of that state.
 */
public final class ProjectVersions {
    /** A read of the marks races a concurrent save at most this often before the page is rendered and not kept. */
    private static final int READ_ATTEMPTS = 3;

    /** What a result page of the project is a function of, besides its address and the viewer. */
    public record Version(long project, long model, long catalogue, long firm, long marks) {}

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

    /** The versions as they stand: not found when there is no such project. */
    public Version of(long projectId) {
        return sql.readOne(c -> read(c, projectId));
    }

    /**
     * The versions in one statement (it runs on every request for a kept page). {@code marks_version} counts mark
     * renames: a rename changes a mark's text and no model version; which member carries which mark, and which marks
     * there are, change only in a model write, with the model's version.
     */
    static Version read(Connection c, long projectId) throws SQLException {
        // plain JDBC: the mapping layer was half the cost of this one small statement
        try (PreparedStatement st = c.prepareStatement(VERSIONS)) {
            st.setLong(1, projectId);
            try (ResultSet rs = st.executeQuery()) {
                if (!rs.next()) throw new NotFound("project", projectId);
                return new Version(projectId, rs.getLong(1), rs.getLong(2), rs.getLong(3), rs.getLong(4));
            }
        }
    }

    private static final String VERSIONS = "SELECT p.version, (SELECT catalogue_version FROM firm_state WHERE id = 1), "
            + "COALESCE((SELECT version FROM firm_setting WHERE id = 1), 0), p.marks_version FROM project p WHERE p.id = ?";

    /** The results and marks to render a page from, with the version they are exactly of when no save raced them. */
    public State state(long projectId) {
        for (int attempt = 1; ; attempt++) {
            Results.Computed computed = results.of(projectId);
            Model m = computed.model();
            State s = sql.tx(c -> {
                // which member carries which mark is written with the version: the same version before and after
                // the marks are read means they are the marks of this model
                Version before = read(c, projectId);
                // the marks the write of this very building gave it, unless a rename has come since; else assigned again
                MarkSheets given = results.marks(computed, before.marks());
                MarkSheets marks = given != null ? given : MarkBook.read(c, projectId, computed.derived());
                Version after = read(c, projectId);
                boolean exact = before.model() == m.project().version() && after.model() == before.model()
                        && after.marks() == before.marks() && results.kept(computed);
                return new State(computed, marks, !exact ? null
                        : new Version(projectId, m.project().version(), m.catalogueVersion(), m.firmVersion(), before.marks()));
            });
            if (s.version() != null || attempt == READ_ATTEMPTS) return s;
        }
    }
}
