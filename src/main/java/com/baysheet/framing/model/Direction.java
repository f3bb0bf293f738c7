package com.baysheet.framing.model;

/** The direction infill beams span in: along x (between girders on x lines) or along y. */
public enum Direction {
    X, Y;

    public Direction other() { return this == X ? Y : X; }
}
