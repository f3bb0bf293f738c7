package com.baysheet.web;

/**
 * Writes a {@link PlanView} as SVG markup directly: a plan has hundreds of shapes, and drawing them through
 * the template engine was most of a member page's time. Every text and link is XML-escaped here, since
 * grid and member names come from users.
 */
final class PlanSvg {
    private PlanSvg() {}

    static String of(PlanView p) {
        StringBuilder s = new StringBuilder(64 * (p.bays().size() + p.members().size() + p.gridLines().size() + 8));
        s.append("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 ").append(n(p.width())).append(' ').append(n(p.height()))
         .append("\" width=\"").append(n(p.width())).append("\" height=\"").append(n(p.height()))
         .append("\" role=\"img\" aria-label=\"Framing plan\">");
        for (PlanView.Shape b : p.bays()) {
            rect(s, b, b.cls()).append(" fill=\"").append(esc(b.fill())).append("\"><title>").append(esc(b.title())).append("</title></rect>");
        }
        for (PlanView.Shape l : p.gridLines()) line(s, l, "grid").append("/>");
        for (PlanView.Shape t : p.gridLabels()) {
            s.append("<g class=\"grid-name\"><circle cx=\"").append(n(t.x())).append("\" cy=\"").append(n(t.y())).append("\" r=\"11\"/>")
             .append("<text x=\"").append(n(t.x())).append("\" y=\"").append(n(t.y() + 4)).append("\" text-anchor=\"middle\">")
             .append(esc(t.title())).append("</text></g>");
        }
        for (PlanView.Shape l : p.lineLoads()) {
            double mx = (l.x() + l.x2()) / 2, my = (l.y() + l.y2()) / 2;
            boolean vertical = l.x() == l.x2();
            s.append("<g class=\"line-load\"><title>").append(esc("line load: " + l.title())).append("</title>");
            line(s, l, "line-load").append("/>");
            s.append("<text x=\"").append(n(vertical ? mx + 8 : mx)).append("\" y=\"").append(n(vertical ? my : my - 8))
             .append(vertical ? "\" text-anchor=\"start\">" : "\" text-anchor=\"middle\">").append(esc(l.title())).append("</text></g>");
        }
        for (PlanView.Shape d : p.drifts())
            rect(s, d, "drift").append("><title>").append(esc(d.title())).append("</title></rect>");
        for (PlanView.Shape pt : p.pointLoads()) {
            s.append("<g class=\"point-load\"><title>").append(esc("point load: " + pt.title())).append("</title><circle cx=\"")
             .append(n(pt.x())).append("\" cy=\"").append(n(pt.y())).append("\" r=\"6\"/><text x=\"").append(n(pt.x() + 9))
             .append("\" y=\"").append(n(pt.y() - 7)).append("\">").append(esc(pt.title())).append("</text></g>");
        }
        for (PlanView.Shape t : p.tributary()) rect(s, t, "tributary").append("><title>tributary area</title></rect>");
        for (int i = 0; i < p.members().size(); i++) {
            PlanView.Shape m = p.members().get(i);
            s.append("<a href=\"").append(esc(m.href())).append("\"><title>").append(esc(m.title())).append("</title>");
            if (m.w() == 0) line(s, m, "member " + m.cls()).append("/>");
            else rect(s, m, "member " + m.cls()).append("/>");
            if (i < p.marks().size()) {
                PlanView.Shape t = p.marks().get(i);
                s.append("<text class=\"mark\" x=\"").append(n(t.x())).append("\" y=\"").append(n(t.y()))
                 .append("\" text-anchor=\"middle\">").append(esc(t.title())).append("</text>");
            }
            s.append("</a>");
        }
        return s.append("</svg>").toString();
    }

    private static StringBuilder rect(StringBuilder s, PlanView.Shape r, String cls) {
        return s.append("<rect x=\"").append(n(r.x())).append("\" y=\"").append(n(r.y())).append("\" width=\"").append(n(r.w()))
                .append("\" height=\"").append(n(r.h())).append("\" class=\"").append(esc(cls)).append('"');
    }

    private static StringBuilder line(StringBuilder s, PlanView.Shape l, String cls) {
        return s.append("<line x1=\"").append(n(l.x())).append("\" y1=\"").append(n(l.y())).append("\" x2=\"").append(n(l.x2()))
                .append("\" y2=\"").append(n(l.y2())).append("\" class=\"").append(esc(cls)).append('"');
    }

    /** Screen units to a tenth of a pixel. */
    static String n(double v) {
        long t = Math.round(v * 10);
        return t % 10 == 0 ? Long.toString(t / 10) : (t < 0 && t > -10 ? "-0." + (-t) : (t / 10) + "." + Math.abs(t % 10));
    }

    static String esc(String v) {
        if (v == null) return "";
        StringBuilder out = null;
        for (int i = 0; i < v.length(); i++) {
            char c = v.charAt(i);
            String r = switch (c) {
                case '&' -> "&amp;";
                case '<' -> "&lt;";
                case '>' -> "&gt;";
                case '"' -> "&quot;";
                case '\'' -> "&#39;";
                default -> null;
            };
            if (r != null && out == null) out = new StringBuilder(v.length() + 16).append(v, 0, i);
            if (out != null) {
                if (r != null) out.append(r);
                else out.append(c);
            }
        }
        return out == null ? v : out.toString();
    }
}
