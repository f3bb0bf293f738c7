package com.baysheet.engine.record;

/** A note on a record: information, or a caution the checking engineer must read. */
public record Note(Level level, String text, Clause clause) {
    public enum Level { INFO, CAUTION }
}
