package com.baysheet.framing.model;

/** A side of a bay: north is +y, east is +x. */
public enum Side { NORTH, SOUTH, EAST, WEST }
