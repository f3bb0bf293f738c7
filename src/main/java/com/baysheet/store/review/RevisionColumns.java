package com.baysheet.store.review;

import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetRevision;
import com.baysheet.review.SheetRevision.Approval;
import com.baysheet.review.SheetRevision.Issue;
import com.baysheet.review.SheetRevision.Preparer;
import com.baysheet.review.SheetState;

import org.jdbi.v3.core.statement.SqlStatement;

import java.sql.Date;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.LocalDate;

/** How a {@link SheetRevision} maps onto the columns of sheet_revision, both ways, by name. */
final class RevisionColumns {
    static final String NAMES = "state, preparer_id, preparer_initials, prepared_on, inputs_sha256, approver_id, "
            + "approver_initials, approved_on, issuer_id, issued_on, pdf_sha256, description";
    static final String VALUES = ":state, :preparerId, :preparerInitials, :preparedOn, :inputsSha256, :approverId, "
            + ":approverInitials, :approvedOn, :issuerId, :issuedOn, :pdfSha256, :description";
    static final String ASSIGN = "state = :state, preparer_id = :preparerId, preparer_initials = :preparerInitials, "
            + "prepared_on = :preparedOn, inputs_sha256 = :inputsSha256, approver_id = :approverId, "
            + "approver_initials = :approverInitials, approved_on = :approvedOn, issuer_id = :issuerId, "
            + "issued_on = :issuedOn, pdf_sha256 = :pdfSha256, description = :description";

    private RevisionColumns() {}

    /** Binds the twelve columns of {@link #VALUES} and {@link #ASSIGN}; an absent part of the revision binds typed NULLs. */
    static <S extends SqlStatement<S>> S bind(S st, SheetRevision r) {
        Preparer p = r.preparer();
        Approval a = r.approval();
        Issue s = r.issue();
        return st.bind("state", r.state().name())
                .bind("preparerId", p == null ? null : p.userId())
                .bind("preparerInitials", p == null ? null : p.initials())
                .bindByType("preparedOn", p == null ? null : p.on(), LocalDate.class)
                .bind("inputsSha256", r.fingerprint())
                .bind("approverId", a == null ? null : a.checkerId())
                .bind("approverInitials", a == null ? null : a.initials())
                .bindByType("approvedOn", a == null ? null : a.on(), LocalDate.class)
                .bind("issuerId", s == null ? null : s.issuerId())
                .bindByType("issuedOn", s == null ? null : s.on(), LocalDate.class)
                .bind("pdfSha256", s == null ? null : s.pdfSha256())
                .bind("description", s == null ? null : s.description());
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

    private static LocalDate day(ResultSet rs, String col) throws SQLException {
        Date d = rs.getDate(col);
        return d == null ? null : d.toLocalDate();
    }
}
