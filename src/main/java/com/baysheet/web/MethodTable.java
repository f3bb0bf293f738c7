package com.baysheet.web;

import com.baysheet.engine.member.MethodComparison;
import com.baysheet.engine.units.Display;
import com.baysheet.framing.DerivedMember;

import java.util.ArrayList;
import java.util.List;

/**
 * Members side by side under every floor reduction method their project could choose: for each, the factor the
 * reducible loads take and the reduced floor live load, the project's own method first. As a page table and as CSV.
 */
record MethodTable(List<String> methods, List<Line> lines) {
    /** One member: its name, page and a cell per method. */
    record Line(String name, String href, String role, String unreduced, List<Cell> cells) {}

    record Cell(String factor, String load) {}

    static MethodTable of(List<DerivedMember> members, String href, UnitLabels units) {
        List<String> methods = new ArrayList<>();
        List<Line> lines = new ArrayList<>();
        for (DerivedMember m : members) {
            List<MethodComparison.Row> rows = m.result().methods();
            if (rows.isEmpty()) continue;
            if (methods.isEmpty()) rows.forEach(r -> methods.add(r.title() + (r.own() ? " (project's)" : "")));
            List<Cell> cells = rows.stream().map(r -> new Cell(Display.sig3(r.factor()), units.force(r.reduced()))).toList();
            lines.add(new Line(m.name(), href + m.id(), role(m), units.force(rows.get(0).unreduced()), cells));
        }
        return new MethodTable(methods, lines);
    }

    private static String role(DerivedMember m) {
        return m.role().name().toLowerCase().replace('_', ' ');
    }

    /** RFC 4180 CSV, full precision in the project's base units (lb or kN), one line per member. */
    static String csv(List<DerivedMember> members, String forceUnit) {
        StringBuilder b = new StringBuilder();
        List<String> header = new ArrayList<>(List.of("member", "name", "role", "L unreduced (" + forceUnit + ")"));
        boolean headed = false;
        for (DerivedMember m : members) {
            List<MethodComparison.Row> rows = m.result().methods();
            if (rows.isEmpty()) continue;
            if (!headed) {
                for (MethodComparison.Row r : rows) {
                    String t = r.title() + (r.own() ? " (project's)" : "");
                    header.add("f, " + t);
                    header.add("L reduced (" + forceUnit + "), " + t);
                }
                line(b, header);
                headed = true;
            }
            List<String> cells = new ArrayList<>(List.of(m.id(), m.name(), role(m), Double.toString(rows.get(0).unreduced())));
            for (MethodComparison.Row r : rows) {
                cells.add(Double.toString(r.factor()));
                cells.add(Double.toString(r.reduced()));
            }
            line(b, cells);
        }
        if (!headed) line(b, header);
        return b.toString();
    }

    private static void line(StringBuilder b, List<String> cells) {
        for (int i = 0; i < cells.size(); i++) b.append(i == 0 ? "" : ",").append(field(cells.get(i)));
        b.append("\r\n");
    }

    /** Quoted, quotes doubled; a leading =, +, - or @ gets an apostrophe so a spreadsheet never runs it as a formula. */
    static String field(String s) {
        String t = s == null ? "" : s;
        if (!t.isEmpty() && "=+-@\t\r".indexOf(t.charAt(0)) >= 0) t = "'" + t;
        return '"' + t.replace("\"", "\"\"") + '"';
    }
}
