package com.baysheet.store.review;

import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetRevision;
import com.baysheet.store.Sql;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Rows of review_sheet and sheet_revision, on the caller's connection. The PDF column is read only on its own. */
final class Revisions {
    private static final String SELECT = "SELECT r.id, r.version, r.revision_no, r.state, r.preparer_id, r.preparer_initials, "
            + "r.prepared_on, r.inputs_sha256, r.record_json, r.approver_id, r.approver_initials, r.approved_on, "
            + "r.issuer_id, r.issued_on, r.pdf_sha256, r.description, s.project_id, s.subject "
            + "FROM sheet_revision r JOIN review_sheet s ON s.id = r.sheet_id ";
    /** The SQL state of a unique-key violation on both databases. */
    private static final String UNIQUE_VIOLATION = "23505";

    private Revisions() {}

    static Optional<StoredRevision> current(Connection c, SheetRef ref) throws SQLException {
        List<StoredRevision> h = list(c, SELECT + "WHERE s.project_id = ? AND s.subject = ? ORDER BY r.revision_no DESC LIMIT 1",
                ref.projectId(), ref.subject());
        return h.stream().findFirst();
    }

    static List<StoredRevision> history(Connection c, SheetRef ref) throws SQLException {
        return list(c, SELECT + "WHERE s.project_id = ? AND s.subject = ? ORDER BY r.revision_no", ref.projectId(), ref.subject());
    }

    static Optional<StoredRevision> byId(Connection c, long id) throws SQLException {
        return list(c, SELECT + "WHERE r.id = ?", id).stream().findFirst();
    }

    /** The latest revision of every sheet of a project. */
    static List<StoredRevision> latestOf(Connection c, long projectId) throws SQLException {
        return list(c, SELECT + "WHERE s.project_id = ? AND r.revision_no = "
                + "(SELECT MAX(x.revision_no) FROM sheet_revision x WHERE x.sheet_id = r.sheet_id) ORDER BY s.subject", projectId);
    }

    /** The revision in force of every sheet of a project that has one: its latest issued revision, unless withdrawn. */
    static List<StoredRevision> inForce(Connection c, long projectId) throws SQLException {
        return list(c, SELECT + "WHERE s.project_id = ? AND r.state = 'ISSUED' AND r.withdrawn_at IS NULL ORDER BY s.subject, r.revision_no", projectId);
    }

    /** Withdraws the sheet's issued revision: kept, no longer in force, and withdrawn for good. */
    static void withdraw(Connection c, long projectId, String subject, Instant at) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE sheet_revision SET withdrawn_at = ?, version = version + 1 "
                + "WHERE state = 'ISSUED' AND withdrawn_at IS NULL AND sheet_id = "
                + "(SELECT s.id FROM review_sheet s WHERE s.project_id = ? AND s.subject = ?)")) {
            ps.setObject(1, Sql.stamp(at));
            ps.setLong(2, projectId);
            ps.setString(3, subject);
            ps.executeUpdate();
        }
    }

    /** The subjects of the project's sheets whose issued revision was withdrawn. */
    static java.util.Set<String> withdrawn(Connection c, long projectId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT s.subject FROM sheet_revision r JOIN review_sheet s ON s.id = r.sheet_id "
                + "WHERE s.project_id = ? AND r.state = 'ISSUED' AND r.withdrawn_at IS NOT NULL")) {
            ps.setLong(1, projectId);
            java.util.Set<String> out = new java.util.TreeSet<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) out.add(rs.getString(1));
            }
            return out;
        }
    }

    /** Whether any sheet or package of the project has ever been issued (a withdrawn or superseded issue counts). */
    static boolean everIssued(Connection c, long projectId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT COUNT(*) FROM sheet_revision r JOIN review_sheet s ON s.id = r.sheet_id "
                + "WHERE s.project_id = ? AND r.state IN ('ISSUED', 'SUPERSEDED')")) {
            ps.setLong(1, projectId);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getLong(1) > 0;
            }
        }
    }

    /** After a revision is issued: the sheet's earlier issued revision is superseded by it. */
    static void supersedeEarlier(Connection c, long issuedId, Instant at) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE sheet_revision SET state = 'SUPERSEDED', version = version + 1, "
                + "updated_at = ? WHERE state = 'ISSUED' AND id <> ? AND sheet_id = (SELECT x.sheet_id FROM sheet_revision x WHERE x.id = ?)")) {
            ps.setObject(1, Sql.stamp(at));
            ps.setLong(2, issuedId);
            ps.setLong(3, issuedId);
            ps.executeUpdate();
        }
    }

    static List<StoredRevision> withPdf(Connection c, String sha256) throws SQLException {
        return list(c, SELECT + "WHERE r.pdf_sha256 = ? ORDER BY s.project_id, s.subject, r.revision_no", sha256);
    }

    /** Whether this revision was withdrawn (its members were deleted while it was in force). */
    static boolean wasWithdrawn(Connection c, long revisionId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT COUNT(*) FROM sheet_revision WHERE id = ? AND withdrawn_at IS NOT NULL")) {
            ps.setLong(1, revisionId);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getLong(1) > 0;
            }
        }
    }

    /** The sheet's revision in force: its issued revision, unless withdrawn. */
    static Optional<StoredRevision> inForce(Connection c, SheetRef ref) throws SQLException {
        return list(c, SELECT + "WHERE s.project_id = ? AND s.subject = ? AND r.state = 'ISSUED' AND r.withdrawn_at IS NULL",
                ref.projectId(), ref.subject()).stream().findFirst();
    }

    static Optional<byte[]> pdf(Connection c, long revisionId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT pdf FROM sheet_revision WHERE id = ? AND pdf IS NOT NULL")) {
            ps.setLong(1, revisionId);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? Optional.of(rs.getBytes(1)) : Optional.empty();
            }
        }
    }

    /** Creates the sheet and its first revision; a sheet created by someone else meanwhile is a conflict. */
    static long insertFirst(Connection c, SheetRef ref, SheetRevision r, String recordJson, Instant at) throws SQLException {
        long sheetId;
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO review_sheet (project_id, subject) VALUES (?, ?)",
                Statement.RETURN_GENERATED_KEYS)) {
            ps.setLong(1, ref.projectId());
            ps.setString(2, ref.subject());
            ps.executeUpdate();
            sheetId = key(ps);
        } catch (SQLException e) {
            if (UNIQUE_VIOLATION.equals(e.getSQLState())) throw new ConcurrentChange("The sheet " + ref.subject());
            throw e;
        }
        return insert(c, sheetId, r, recordJson, at);
    }

    /** Adds the next revision of the sheet the given revision belongs to. */
    static long insertNext(Connection c, long afterRevisionId, SheetRevision r, String recordJson, Instant at) throws SQLException {
        long sheetId;
        try (PreparedStatement ps = c.prepareStatement("SELECT sheet_id FROM sheet_revision WHERE id = ?")) {
            ps.setLong(1, afterRevisionId);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                sheetId = rs.getLong(1);
            }
        }
        return insert(c, sheetId, r, recordJson, at);
    }

    /** Takes the revision for this transaction if it is still at the version the user saw; false if not. */
    static boolean claim(Connection c, long id, long version) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "UPDATE sheet_revision SET version = version + 1 WHERE id = ? AND version = ?")) {
            ps.setLong(1, id);
            ps.setLong(2, version);
            return ps.executeUpdate() == 1;
        }
    }

    /** Writes a revision's new state; the PDF is written only when given (once, at issue). */
    static void write(Connection c, long id, SheetRevision r, String recordJson, byte[] pdf, Instant at) throws SQLException {
        String q = "UPDATE sheet_revision SET " + RevisionColumns.ASSIGN + ", record_json = ?, updated_at = ?"
                + (pdf == null ? "" : ", pdf = ?") + " WHERE id = ?";
        try (PreparedStatement ps = c.prepareStatement(q)) {
            int i = RevisionColumns.bind(ps, 1, r);
            ps.setString(i++, recordJson);
            ps.setObject(i++, Sql.stamp(at));
            if (pdf != null) ps.setBytes(i++, pdf);
            ps.setLong(i, id);
            ps.executeUpdate();
        }
    }

    private static long insert(Connection c, long sheetId, SheetRevision r, String recordJson, Instant at) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO sheet_revision (sheet_id, revision_no, version, "
                + RevisionColumns.NAMES + ", record_json, updated_at) VALUES (?, ?, 1, " + RevisionColumns.MARKS + ", ?, ?)",
                Statement.RETURN_GENERATED_KEYS)) {
            ps.setLong(1, sheetId);
            ps.setInt(2, r.number());
            int i = RevisionColumns.bind(ps, 3, r);
            ps.setString(i++, recordJson);
            ps.setObject(i, Sql.stamp(at));
            ps.executeUpdate();
            return key(ps);
        }
    }

    private static long key(PreparedStatement ps) throws SQLException {
        try (ResultSet keys = ps.getGeneratedKeys()) {
            keys.next();
            return keys.getLong(1);
        }
    }

    private static List<StoredRevision> list(Connection c, String q, Object... args) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(q)) {
            for (int i = 0; i < args.length; i++) ps.setObject(i + 1, args[i]);
            List<StoredRevision> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) out.add(RevisionColumns.read(rs));
            }
            return out;
        }
    }
}
