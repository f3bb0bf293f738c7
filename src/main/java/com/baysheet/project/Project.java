package com.baysheet.project;

/** A stored project: its id, the version every change is based on, and what it is. */
public record Project(long id, long version, ProjectInfo info) {}
