package com.baysheet.review;

import com.baysheet.auth.Role;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.Sketch;
import com.baysheet.engine.record.Step;

import java.time.LocalDate;
import java.util.List;

/** People and records the review tests share, so that each test states only what it varies. */
final class Sheets {
    private Sheets() {}

    static final Actor ENGINEER = new Actor(1, "EP", Role.ENGINEER);
    static final Actor OTHER_ENGINEER = new Actor(4, "OE", Role.ENGINEER);
    static final Actor CHECKER = new Actor(2, "CK", Role.CHECKER);
    static final Actor SECOND_CHECKER = new Actor(5, "SC", Role.CHECKER);
    static final Actor ADMIN = new Actor(3, "AD", Role.ADMINISTRATOR);
    static final LocalDate DAY = LocalDate.of(2026, 3, 2);
    static final String FP = "a".repeat(64);
    static final String FP2 = "b".repeat(64);
    static final String PDF = "c".repeat(64);

    static CalcRecord record(double span, double liveLoad) {
        return new CalcRecord("B-1", "ASCE 7-16", "US",
                List.of(new Entry("span", "Span", span, "ft", String.valueOf(span), "ft"),
                        new Entry("L0", "Unreduced live load", 50, "psf", "50", "psf")),
                List.of(new Step("K_LL", "Live load element factor", "Table 4.7-1", "2", 2, "", "2", "",
                        new Clause("ASCE 7-16", "Table 4.7-1", "seen"))),
                List.of(new Entry("L", "Reduced live load", liveLoad, "psf", String.valueOf(liveLoad), "psf"),
                        new Entry("M", "Moment", 12500, "lb·ft", "12.5", "kip·ft")),
                List.of("M"), List.of(), Sketch.NONE);
    }

    static SheetRevision submitted() {
        return SheetRevision.opened(1).submit(ENGINEER, FP, DAY);
    }

    static SheetRevision returned() {
        return submitted().returnWithMarkups(CHECKER, 1);
    }

    static SheetRevision approved() {
        return submitted().approve(CHECKER, DAY, 0, FP);
    }

    static SheetRevision issued() {
        return approved().issue(CHECKER, DAY, PDF, FP, "First issue");
    }
}
