package com.baysheet.sheet;

/**
 * How a copy that is not issued marks itself, in the words of the office's own country: a US office prints a
 * check print, not for construction and not to be sealed; an SI project keeps the checking copy, not for
 * submittal.
 */
enum Wording {
    US("CHECK PRINT — NOT FOR CONSTRUCTION", "CHECK PRINT — NOT FOR CONSTRUCTION. Markups may be open; not to be sealed."),
    SI("CHECKING COPY — NOT FOR SUBMITTAL", "CHECKING COPY — NOT FOR SUBMITTAL. Markups may be open; do not seal.");

    /** The mark across the page and in the title block's band. */
    final String mark;
    /** The line above the seal box. */
    final String closing;

    Wording(String mark, String closing) {
        this.mark = mark;
        this.closing = closing;
    }

    /** By a record's unit system ("US" or "SI"). */
    static Wording of(String units) { return "US".equals(units) ? US : SI; }

    /** A package's: its member sheets' unit system, else its criteria's. */
    static Wording of(CalcPackage p) {
        if (!p.sheets().isEmpty()) return of(p.sheets().get(0).record().units());
        return p.criteria().units().startsWith("US") ? US : SI;
    }
}
