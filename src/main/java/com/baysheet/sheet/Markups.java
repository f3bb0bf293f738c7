package com.baysheet.sheet;

import java.util.List;

/** The markups of a checking copy, numbered M1, M2, ... in the order given; none on an issued copy. */
final class Markups {
    static final Markups ISSUED = new Markups(false, List.of());

    private final boolean checking;
    private final List<Markup> list;

    private Markups(boolean checking, List<Markup> list) {
        this.checking = checking;
        this.list = List.copyOf(list);
    }

    static Markups checking(List<Markup> markups) { return new Markups(true, markups); }

    boolean checking() { return checking; }

    List<Markup> list() { return list; }

    /** "M1 M3" for the markups on this step symbol or input key, or "" where there are none. */
    String on(String target) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < list.size(); i++)
            if (!list.get(i).target().isEmpty() && list.get(i).target().equals(target))
                b.append(b.length() == 0 ? "" : " ").append("M").append(i + 1);
        return b.toString();
    }
}
