package com.baysheet.engine.member;

/**
 * Evaluates a substituted-values text as a reader would: numbers, + and − (or -), × and /, a square (²) and
 * brackets. {@link #evalAbsolute} takes every number as positive, the scale of the rounding in the text.
 */
final class Expression {
    private final String s;
    private final boolean absolute;
    private int i;

    private Expression(String s, boolean absolute) {
        this.s = s.replace(" ", "");
        this.absolute = absolute;
    }

    static double eval(String text) { return new Expression(text, false).whole(); }

    static double evalAbsolute(String text) { return new Expression(text, true).whole(); }

    private double whole() {
        double v = sum();
        if (i != s.length()) throw new IllegalArgumentException("not an expression at " + i + ": " + s);
        return v;
    }

    private double sum() {
        double v = product();
        while (i < s.length() && (s.charAt(i) == '+' || minus(s.charAt(i)))) {
            boolean add = s.charAt(i++) == '+';
            double t = product();
            v = add || absolute ? v + t : v - t;
        }
        return v;
    }

    private double product() {
        double v = factor();
        while (i < s.length() && (s.charAt(i) == '×' || s.charAt(i) == '/')) {
            boolean times = s.charAt(i++) == '×';
            double f = factor();
            v = times ? v * f : v / f;
        }
        return v;
    }

    private double factor() {
        if (minus(s.charAt(i))) {
            i++;
            double f = factor();
            return absolute ? f : -f;
        }
        double v;
        if (s.charAt(i) == '(') {
            i++;
            v = sum();
            if (s.charAt(i++) != ')') throw new IllegalArgumentException("unclosed bracket: " + s);
        } else {
            int start = i;
            while (i < s.length() && (Character.isDigit(s.charAt(i)) || s.charAt(i) == '.')) i++;
            if (start == i) throw new IllegalArgumentException("a number expected at " + i + ": " + s);
            v = Double.parseDouble(s.substring(start, i));
        }
        if (i < s.length() && s.charAt(i) == '²') { i++; v = v * v; }
        return v;
    }

    private static boolean minus(char c) { return c == '−' || c == '-'; }
}
