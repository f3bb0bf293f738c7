package com.baysheet.engine;

/**
 * A value the engine refuses: names the field and the value so that a form, the API or the CLI can
 * show it beside the input. Never thrown for a fault of ours.
 */
public final class InputError extends IllegalArgumentException {
    private final String field;
    private final String value;

    public InputError(String field, Object value, String problem) {
        super(field + ": " + problem + " (got " + value + ")");
        this.field = field;
        this.value = String.valueOf(value);
    }

    public String field() { return field; }

    public String value() { return value; }

    /** The problem without the field prefix, for showing beside the field itself. */
    public String problem() {
        String m = getMessage();
        return m.substring(field.length() + 2);
    }
}
