package com.baysheet.store.review;

import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetRevision;
import com.baysheet.review.SheetRevision.Approval;
import com.baysheet.review.SheetRevision.Issue;
import com.baysheet.review.SheetRevision.Preparer;
import com.baysheet.review.SheetState;

import java.sql.Date;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.LocalDate;

/** How a {@link SheetRevision} maps onto the columns of sheet_revision, both ways. */
final class RevisionColumns {
    static final String NAMES = "state, preparer_id, preparer_initials, prepared_on, inputs_sha256, approver_id, "
            + "approver_initials, approved_on, issuer_id, issued_on, pdf_sha256, description";
    static final String MARKS = "?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?";
    static final String ASSIGN = "state = ?, preparer_id = ?, preparer_initials = ?, prepared_on = ?, inputs_sha256 = ?, "
            + "approver_id = ?, approver_initials = ?, approved_on = ?, issuer_id = ?, issued_on = ?, pdf_sha256 = ?, description = ?";

    private RevisionColumns() {}

    /** Binds the twelve columns from {@code i}; returns the next index. */
    static int bind(PreparedStatement ps, int i, SheetRevision r) throws SQLException {
        Preparer p = r.preparer();
        Approval a = r.approval();
        Issue s = r.issue();
        ps.setString(i++, r.state().name());
        i = id(ps, i, p == null ? null : p.userId());
        ps.setString(i++, p == null ? null : p.initials());
        i = date(ps, i, p == null ? null : p.on());
        ps.setString(i++, r.fingerprint());
        i = id(ps, i, a == null ? null : a.checkerId());
        ps.setString(i++, a == null ? null : a.initials());
        i = date(ps, i, a == null ? null : a.on());
        i = id(ps, i, s == null ? null : s.issuerId());
        i = date(ps, i, s == null ? null : s.on());
        ps.setString(i++, s == null ? null : s.pdfSha256());
        ps.setString(i++, s == null ? null : s.description());
        return i;
    }

    static StoredRevision read(ResultSet rs) throws SQLException {
        Preparer p = rs.getString("preparer_initials") == null ? null
                : new Preparer(rs.getLong("preparer_id"), rs.getString("preparer_initials"), day(rs, "prepared_on"));
        Approval a = rs.getString("approver_initials") == null ? null
                : new Approval(rs.getLong("approver_id"), rs.getString("approver_initials"), day(rs, "approved_on"));
        Issue s = rs.getString("pdf_sha256") == null ? null
                : new Issue(rs.getLong("issuer_id"), day(rs, "issued_on"), rs.getString("pdf_sha256"), rs.getString("description"));
        SheetRevision r = new SheetRevision(rs.getInt("revision_no"), SheetState.parse(rs.getString("state")), p,
                rs.getString("inputs_sha256"), a, s);
        return new StoredRevision(rs.getLong("id"), new SheetRef(rs.getLong("project_id"), rs.getString("subject")),
                rs.getLong("version"), r, rs.getString("record_json"));
    }

    private static int id(PreparedStatement ps, int i, Long v) throws SQLException {
        if (v == null) ps.setNull(i, Types.BIGINT);
        else ps.setLong(i, v);
        return i + 1;
    }

    private static int date(PreparedStatement ps, int i, LocalDate d) throws SQLException {
        if (d == null) ps.setNull(i, Types.DATE);
        else ps.setDate(i, Date.valueOf(d));
        return i + 1;
    }

    private static LocalDate day(ResultSet rs, String col) throws SQLException {
        Date d = rs.getDate(col);
        return d == null ? null : d.toLocalDate();
    }
}
