package com.baysheet.store.review;

import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetRevision;
import com.baysheet.store.Sql;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.Query;
import org.jdbi.v3.core.statement.UnableToExecuteStatementException;
import org.jdbi.v3.core.statement.Update;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.UnaryOperator;

/** Rows of review_sheet and sheet_revision, on the caller's connection. The PDF column is read only on its own. */
final class Revisions {
    private static final String SELECT = "SELECT r.id, r.version, r.revision_no, r.state, r.preparer_id, r.preparer_initials, "
            + "r.prepared_on, r.inputs_sha256, r.record_json, r.approver_id, r.approver_initials, r.approved_on, "
            + "r.issuer_id, r.issued_on, r.pdf_sha256, r.description, s.project_id, s.subject "
            + "FROM sheet_revision r JOIN review_sheet s ON s.id = r.sheet_id ";
    private static final String OF_SHEET = "WHERE s.project_id = :project AND s.subject = :subject ";
    /** The SQL state of a unique-key violation on both databases. */
    private static final String UNIQUE_VIOLATION = "23505";

    private Revisions() {}

    static Optional<StoredRevision> current(Connection c, SheetRef ref) {
        return list(c, SELECT + OF_SHEET + "ORDER BY r.revision_no DESC LIMIT 1", q -> sheet(q, ref)).stream().findFirst();
    }

    static List<StoredRevision> history(Connection c, SheetRef ref) {
        return list(c, SELECT + OF_SHEET + "ORDER BY r.revision_no", q -> sheet(q, ref));
    }

    static Optional<StoredRevision> byId(Connection c, long id) {
        return list(c, SELECT + "WHERE r.id = :id", q -> q.bind("id", id)).stream().findFirst();
    }

    /** The latest revision of every sheet of a project. */
    static List<StoredRevision> latestOf(Connection c, long projectId) {
        return list(c, SELECT + "WHERE s.project_id = :project AND r.revision_no = "
                + "(SELECT MAX(x.revision_no) FROM sheet_revision x WHERE x.sheet_id = r.sheet_id) ORDER BY s.subject",
                q -> q.bind("project", projectId));
    }

    /** The revision in force of every sheet of a project that has one: its latest issued revision, unless withdrawn. */
    static List<StoredRevision> inForce(Connection c, long projectId) {
        return list(c, SELECT + "WHERE s.project_id = :project AND r.state = 'ISSUED' AND r.withdrawn_at IS NULL "
                + "ORDER BY s.subject, r.revision_no", q -> q.bind("project", projectId));
    }

    /** Withdraws the sheet's issued revision: kept, no longer in force, and withdrawn for good. */
    static void withdraw(Connection c, long projectId, String subject, Instant at) {
        update(c, "UPDATE sheet_revision SET withdrawn_at = :at, version = version + 1 "
                + "WHERE state = 'ISSUED' AND withdrawn_at IS NULL AND sheet_id = "
                + "(SELECT s.id FROM review_sheet s WHERE s.project_id = :project AND s.subject = :subject)",
                u -> u.bind("at", Sql.stampOf(at)).bind("project", projectId).bind("subject", subject));
    }

    /** The subjects of the project's sheets whose issued revision was withdrawn. */
    static Set<String> withdrawn(Connection c, long projectId) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT s.subject FROM sheet_revision r JOIN review_sheet s ON s.id = r.sheet_id "
                            + "WHERE s.project_id = :project AND r.state = 'ISSUED' AND r.withdrawn_at IS NOT NULL")
                    .bind("project", projectId).mapTo(String.class).collect(java.util.stream.Collectors.toCollection(TreeSet::new));
        }
    }

    /** Whether any sheet or package of the project has ever been issued (a withdrawn or superseded issue counts). */
    static boolean everIssued(Connection c, long projectId) {
        return count(c, "SELECT COUNT(*) FROM sheet_revision r JOIN review_sheet s ON s.id = r.sheet_id "
                + "WHERE s.project_id = :id AND r.state IN ('ISSUED', 'SUPERSEDED')", projectId) > 0;
    }

    /** After a revision is issued: the sheet's earlier issued revision is superseded by it. */
    static void supersedeEarlier(Connection c, long issuedId, Instant at) {
        update(c, "UPDATE sheet_revision SET state = 'SUPERSEDED', version = version + 1, updated_at = :at "
                + "WHERE state = 'ISSUED' AND id <> :issued AND sheet_id = (SELECT x.sheet_id FROM sheet_revision x WHERE x.id = :issued)",
                u -> u.bind("at", Sql.stampOf(at)).bind("issued", issuedId));
    }

    static List<StoredRevision> withPdf(Connection c, String sha256) {
        return list(c, SELECT + "WHERE r.pdf_sha256 = :sha ORDER BY s.project_id, s.subject, r.revision_no", q -> q.bind("sha", sha256));
    }

    /** Whether this revision was withdrawn (its members were deleted while it was in force). */
    static boolean wasWithdrawn(Connection c, long revisionId) {
        return count(c, "SELECT COUNT(*) FROM sheet_revision WHERE id = :id AND withdrawn_at IS NOT NULL", revisionId) > 0;
    }

    /** The sheet's revision in force: its issued revision, unless withdrawn. */
    static Optional<StoredRevision> inForce(Connection c, SheetRef ref) {
        return list(c, SELECT + OF_SHEET + "AND r.state = 'ISSUED' AND r.withdrawn_at IS NULL", q -> sheet(q, ref)).stream().findFirst();
    }

    static Optional<byte[]> pdf(Connection c, long revisionId) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT pdf FROM sheet_revision WHERE id = :id AND pdf IS NOT NULL").bind("id", revisionId)
                    .map((rs, ctx) -> rs.getBytes(1)).findOne();
        }
    }

    /** Creates the sheet and its first revision; a sheet created by someone else meanwhile is a conflict. */
    static long insertFirst(Connection c, SheetRef ref, SheetRevision r, String recordJson, Instant at) {
        long sheetId;
        try (Handle h = Sql.on(c)) {
            sheetId = h.createUpdate("INSERT INTO review_sheet (project_id, subject) VALUES (:project, :subject)")
                    .bind("project", ref.projectId()).bind("subject", ref.subject())
                    .executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
        } catch (UnableToExecuteStatementException e) {
            if (e.getCause() instanceof SQLException s && UNIQUE_VIOLATION.equals(s.getSQLState()))
                throw new ConcurrentChange("The sheet " + ref.subject());
            throw e;
        }
        return insert(c, sheetId, r, recordJson, at);
    }

    /** Adds the next revision of the sheet the given revision belongs to. */
    static long insertNext(Connection c, long afterRevisionId, SheetRevision r, String recordJson, Instant at) {
        long sheetId;
        try (Handle h = Sql.on(c)) {
            sheetId = h.createQuery("SELECT sheet_id FROM sheet_revision WHERE id = :id").bind("id", afterRevisionId)
                    .mapTo(Long.class).one();
        }
        return insert(c, sheetId, r, recordJson, at);
    }

    /** Takes the revision for this transaction if it is still at the version the user saw; false if not. */
    static boolean claim(Connection c, long id, long version) {
        return update(c, "UPDATE sheet_revision SET version = version + 1 WHERE id = :id AND version = :version",
                u -> u.bind("id", id).bind("version", version)) == 1;
    }

    /** Writes a revision's new state; the PDF is written only when given (once, at issue). */
    static void write(Connection c, long id, SheetRevision r, String recordJson, byte[] pdf, Instant at) {
        update(c, "UPDATE sheet_revision SET " + RevisionColumns.ASSIGN + ", record_json = :recordJson, updated_at = :at"
                + (pdf == null ? "" : ", pdf = :pdf") + " WHERE id = :id", u -> {
                    RevisionColumns.bind(u, r).bind("recordJson", recordJson).bind("at", Sql.stampOf(at)).bind("id", id);
                    return pdf == null ? u : u.bind("pdf", pdf);
                });
    }

    private static long insert(Connection c, long sheetId, SheetRevision r, String recordJson, Instant at) {
        try (Handle h = Sql.on(c)) {
            Update u = h.createUpdate("INSERT INTO sheet_revision (sheet_id, revision_no, version, " + RevisionColumns.NAMES
                    + ", record_json, updated_at) VALUES (:sheet, :number, 1, " + RevisionColumns.VALUES + ", :recordJson, :at)");
            return RevisionColumns.bind(u, r).bind("sheet", sheetId).bind("number", r.number()).bind("recordJson", recordJson)
                    .bind("at", Sql.stampOf(at)).executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
        }
    }

    private static Query sheet(Query q, SheetRef ref) {
        return q.bind("project", ref.projectId()).bind("subject", ref.subject());
    }

    private static long count(Connection c, String q, long id) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery(q).bind("id", id).mapTo(Long.class).one();
        }
    }

    private static int update(Connection c, String q, UnaryOperator<Update> binds) {
        try (Handle h = Sql.on(c)) {
            return binds.apply(h.createUpdate(q)).execute();
        }
    }

    private static List<StoredRevision> list(Connection c, String q, UnaryOperator<Query> binds) {
        try (Handle h = Sql.on(c)) {
            return binds.apply(h.createQuery(q)).map((rs, ctx) -> RevisionColumns.read(rs)).list();
        }
    }
}
