package com.baysheet.sheet;

import com.baysheet.engine.record.Note;

import java.util.List;

/**
 * A column take-down as a printed table: headings (with units), one row of shown values per level from the
 * top down, the clauses the table relies on, and the record's notes.
 */
public record TakeDownTable(String title, List<String> headings, List<List<String>> rows, List<String> clauses,
                            List<Note> notes) {
    public TakeDownTable {
        headings = List.copyOf(headings);
        rows = rows.stream().map(List::copyOf).toList();
        clauses = List.copyOf(clauses);
        notes = List.copyOf(notes);
        for (int i = 0; i < rows.size(); i++)
            if (rows.get(i).size() != headings.size())
                throw new IllegalArgumentException(title + ": row " + i + " has " + rows.get(i).size() + " cells for " + headings.size() + " headings");
    }
}
