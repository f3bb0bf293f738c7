package com.baysheet.web.entry;

/**
 * Text a field cannot read as a number: the message names the field and quotes what was typed, so that it
 * can stand beside the field as it is.
 */
public final class EntryRefused extends IllegalArgumentException {
    public EntryRefused(String label, String typed, String problem) {
        super(label + ": could not read \"" + typed + "\": " + problem);
    }
}
