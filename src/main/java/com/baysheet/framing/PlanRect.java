package com.baysheet.framing;

/** An axis-aligned rectangle on plan (ft or m), for tributary outlines. */
public record PlanRect(double x1, double y1, double x2, double y2) {
    public double area() { return Math.abs(x2 - x1) * Math.abs(y2 - y1); }
}
