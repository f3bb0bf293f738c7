package com.baysheet.framing;

/** A member's line on plan (ft or m); a column is a line of zero length at its grid point. */
public record PlanLine(double x1, double y1, double x2, double y2) {}
