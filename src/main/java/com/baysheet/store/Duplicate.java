package com.baysheet.store;

import java.sql.SQLException;
import java.util.Locale;
import java.util.Map;

/**
 * A value that must be unique is taken (a job number, a firm occupancy id, a username): a conflict with
 * what another save did, answered 409 with the field. Two saves at the same moment both pass the check
 * before the insert; the database's unique constraint refuses the second, and that refusal lands here too.
 */
public final class Duplicate extends RuntimeException {
    /** The unique constraints users can run into, by the name the database reports, and the field they guard. */
    private static final Map<String, String> FIELDS = Map.of(
            "uq_project_job_number", "jobNumber",
            "firm_occupancy", "id",
            "uq_level_name", "name",
            "uq_app_user_username", "username");

    /** SQLSTATE of a unique or primary key violation, on H2 and PostgreSQL alike. */
    static final String UNIQUE_VIOLATION = "23505";

    private final String field;
    private final String value;

    public Duplicate(String field, String value, String message) {
        super(field + ": " + message + " (got " + value + ")");
        this.field = field;
        this.value = value;
    }

    /** The duplicate a unique violation stands for, naming the field when the constraint is one users can hit. */
    static Duplicate of(SQLException e) {
        String m = String.valueOf(e.getMessage()).toLowerCase(Locale.ROOT);
        String field = FIELDS.entrySet().stream().filter(f -> m.contains(f.getKey())).map(Map.Entry::getValue)
                .findFirst().orElse("");
        return new Duplicate(field, "(taken)", "is already taken by another save");
    }

    static boolean is(SQLException e) {
        for (Throwable t = e; t != null; t = t.getCause())
            if (t instanceof SQLException s && UNIQUE_VIOLATION.equals(s.getSQLState())) return true;
        return false;
    }

    public String field() { return field; }

    public String value() { return value; }

    /** The problem without the field prefix, for showing beside the field. */
    public String problem() { return getMessage().substring(field.length() + 2); }
}
