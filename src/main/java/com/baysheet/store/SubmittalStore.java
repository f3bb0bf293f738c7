package com.baysheet.store;

import com.baysheet.framing.model.Submittal;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;

/**
 * A project's submittal data: the engineer of record, the licence and the building code as adopted, kept
 * beside the project's own site address and client (which the project settings edit). None of it changes a
 * calculation; a save is still a change of the project, versioned and audited like any other.
 */
public final class SubmittalStore {
    private static final String COLUMNS = "address, client, engineer_of_record, licence_number, licence_state, building_code, code_year";

    private final Sql sql;
    private final ModelWrites writes;

    SubmittalStore(ModelWrites writes) {
        this.sql = writes.sql();
        this.writes = writes;
    }

    public Submittal find(long projectId) {
        return sql.tx(c -> find(c, projectId));
    }

    /** Saves the engineer, licence and code over {@code version}; the site address and client are the project's settings. */
    public Submittal save(Editor who, long projectId, long version, Submittal s) {
        return writes.change(who, c -> "submittal data saved: " + said(s) + "; was: " + said(find(c, projectId)), projectId, version, c -> {
            write(c, projectId, s);
            return find(c, projectId);
        });
    }

    /** The engineer, licence and code of {@code s}, in the caller's change. */
    static void write(Connection c, long projectId, Submittal s) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE project SET engineer_of_record = ?, licence_number = ?, "
                + "licence_state = ?, building_code = ?, code_year = ? WHERE id = ?")) {
            ps.setString(1, s.engineerOfRecord());
            ps.setString(2, s.licenceNumber());
            ps.setString(3, s.licenceState());
            ps.setString(4, s.buildingCode());
            ps.setString(5, s.codeYear());
            ps.setLong(6, projectId);
            ps.executeUpdate();
        }
    }

    static Submittal find(Connection c, long projectId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT " + COLUMNS + " FROM project WHERE id = ?")) {
            ps.setLong(1, projectId);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) throw new NotFound("project", projectId);
                return new Submittal(rs.getString(1), rs.getString(2), rs.getString(3), rs.getString(4), rs.getString(5),
                        rs.getString(6), rs.getString(7));
            }
        }
    }

    private static String said(Submittal s) {
        String eor = s.engineerLine(), code = s.adoptedCode();
        return (eor.isEmpty() ? "no engineer of record" : eor) + ", " + (code.isEmpty() ? "no building code" : s.buildingCode() + " " + s.codeYear());
    }
}
