package com.baysheet.store;

import com.baysheet.framing.model.Submittal;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
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
        try (Handle h = Sql.on(c)) {
            h.createUpdate("UPDATE project SET engineer_of_record = :engineer, licence_number = :licence, "
                            + "licence_state = :licenceState, building_code = :code, code_year = :codeYear WHERE id = :id")
                    .bind("engineer", s.engineerOfRecord()).bind("licence", s.licenceNumber())
                    .bind("licenceState", s.licenceState()).bind("code", s.buildingCode()).bind("codeYear", s.codeYear())
                    .bind("id", projectId).execute();
        }
    }

    static Submittal find(Connection c, long projectId) throws SQLException {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT " + COLUMNS + " FROM project WHERE id = :id").bind("id", projectId)
                    .map((rs, ctx) -> new Submittal(rs.getString("address"), rs.getString("client"), rs.getString("engineer_of_record"),
                            rs.getString("licence_number"), rs.getString("licence_state"), rs.getString("building_code"),
                            rs.getString("code_year")))
                    .findOne().orElseThrow(() -> new NotFound("project", projectId));
        }
    }

    private static String said(Submittal s) {
        String eor = s.engineerLine(), code = s.adoptedCode();
        return (eor.isEmpty() ? "no engineer of record" : eor) + ", " + (code.isEmpty() ? "no building code" : s.buildingCode() + " " + s.codeYear());
    }
}
