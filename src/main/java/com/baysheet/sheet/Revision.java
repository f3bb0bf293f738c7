package com.baysheet.sheet;

import com.baysheet.engine.InputError;

import java.time.LocalDate;

/** One line of a package's revision log. */
public record Revision(String label, LocalDate date, String description, String by) {
    public Revision {
        if (label == null || label.isBlank()) throw new InputError("revision.label", "\"\"", "a revision needs its label");
        if (date == null) throw new InputError("revision.date", "none", "a revision needs its date");
        if (description == null || description.isBlank()) throw new InputError("revision.description", "\"\"", "say what the revision changed");
        by = by == null ? "" : by;
    }
}
