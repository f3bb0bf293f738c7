package com.baysheet.framing;

/**
 * How the pages that label members (plan sheets, schedules, take-down tables, the web plan) are told what to
 * print for each member: the firm's typical marks where the project has them, the member's place
 * ({@link MemberLabel}) where it has not. The framing does not know the marks (they are stored with the review),
 * so whoever reads them passes their labelling down as one of these.
 */
@FunctionalInterface
public interface MemberLabels {
    /** Each member by its place in the grid: what a model without marks prints. */
    MemberLabels PLACES = MemberLabel::of;

    /** The label a plan prints on the member: its mark, or its place where it has none. Never an internal id. */
    String of(DerivedMember m);

    /**
     * The label with the member's place beside a mark ("C1 (Column B/2)"), for a table whose rows are
     * locations, where a mark alone would not say which column a row is; the place alone where the label is it.
     */
    default String placed(DerivedMember m) {
        String label = of(m), place = MemberLabel.of(m);
        return label.equals(place) ? place : label + " (" + place + ")";
    }
}
