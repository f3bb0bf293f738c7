package com.baysheet.store.review;

import com.baysheet.engine.InputError;
import com.baysheet.framing.Derived;
import com.baysheet.framing.TypicalGroup;
import com.baysheet.framing.Typicals;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.Caller;
import com.baysheet.review.Mark;
import com.baysheet.review.MarkAssignment;
import com.baysheet.review.MarkSheets;
import com.baysheet.store.NotFound;
import com.baysheet.store.Sql;
import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.List;

/**
 * The marks of a project's typical members. A model write stores them ({@link MarkWrites#reconcile}) in its own
 * transaction, so that a mark, once given, is the same on every page; a read assigns them the same way without
 * writing, which gives exactly the stored marks (and, for a project not written since marks came in,
 * provisional ones with no sheet yet).
 */
public final class MarkBook {
    private final Sql sql;

    public MarkBook(Sql sql) {
        this.sql = sql;
    }

    /** The marks of this derivation of the project. */
    public MarkSheets of(long projectId, Derived d) {
        return sql.tx(c -> read(c, projectId, d));
    }

    /** The marks of this derivation of the project, read on the caller's connection; writes nothing. */
    public static MarkSheets read(Connection c, long projectId, Derived d) throws SQLException {
        List<Mark> stored = MarkRows.all(c, projectId);
        List<TypicalGroup> groups = d.members().isEmpty() ? List.of() : Typicals.of(d);
        return MarkWrites.sheets(MarkAssignment.of(groups, stored, MarkRows.carried(c, projectId)), stored);
    }

    /** A stored mark by id, carried or not (a mark no member carries keeps its sheet's history). */
    public java.util.Optional<Mark> stored(long projectId, long markId) {
        return sql.tx(c -> MarkRows.all(c, projectId).stream().filter(m -> m.id() == markId).findFirst());
    }

    /**
     * Renames a mark; refused naming the field when the text is not a mark or another mark of the project has it.
     * The sheet keeps its history: its printed record now carries the new mark, so an issued sheet is changed since issue.
     */
    public void rename(long projectId, long markId, String text, Caller who) {
        String to = Mark.checkedText(text);
        sql.tx(c -> {
            Mark m = MarkRows.all(c, projectId).stream().filter(x -> x.id() == markId).findFirst()
                    .orElseThrow(() -> new NotFound("mark", markId));
            for (Mark other : MarkRows.all(c, projectId))
                if (other.id() != markId && other.text().equalsIgnoreCase(to))
                    throw new InputError("mark", to, "is taken by another typical member of this project" + (other.active() ? "" : " (one no member carries now)"));
            if (m.text().equals(to)) return null;
            MarkRows.rename(c, markId, to);
            try (Handle h = Sql.on(c)) {
                h.createUpdate("UPDATE project SET marks_version = marks_version + 1 WHERE id = :id").bind("id", projectId).execute();
            }
            AuditTrail.append(c, AuditEvent.of(who.actor().userId(), who.username(), "rename mark", "project " + projectId + " mark " + m.text(),
                    "renamed " + m.text() + " → " + to, who.address()), sql.now());
            return null;
        });
    }
}
