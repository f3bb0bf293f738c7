package com.baysheet.review;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;

/**
 * What a markup is about: the sheet as a whole, one input (by its key on the record) or one calculation
 * step (by its symbol). Written on forms and in the store as "sheet", "input:KEY" or "step:SYMBOL".
 */
public record MarkupTarget(Kind kind, String ref) {
    public enum Kind { SHEET, INPUT, STEP }

    public static final MarkupTarget SHEET = new MarkupTarget(Kind.SHEET, "");

    public MarkupTarget {
        if (kind == null) throw new IllegalArgumentException("kind: required");
        ref = ref == null ? "" : ref;
        if ((kind == Kind.SHEET) != ref.isEmpty())
            throw new IllegalArgumentException("ref: the sheet has no ref, an input or step has one (got " + kind + " \"" + ref + "\")");
    }

    public String code() {
        return switch (kind) {
            case SHEET -> "sheet";
            case INPUT -> "input:" + ref;
            case STEP -> "step:" + ref;
        };
    }

    /** Reads a stored code without checking it against a record. */
    public static MarkupTarget decode(String code) {
        if (code.equals("sheet")) return SHEET;
        if (code.startsWith("input:")) return new MarkupTarget(Kind.INPUT, code.substring(6));
        if (code.startsWith("step:")) return new MarkupTarget(Kind.STEP, code.substring(5));
        throw new IllegalStateException("stored markup target " + code + " is not one");
    }

    /** Reads a target as posted from a form, which must name an input or step of this record. */
    public static MarkupTarget parse(String field, String code, CalcRecord record) {
        if (code == null || code.isBlank()) return SHEET;
        MarkupTarget t;
        try {
            t = decode(code.strip());
        } catch (IllegalStateException | IllegalArgumentException e) {
            throw new InputError(field, "\"" + code + "\"", "must be the sheet, an input or a step of this sheet");
        }
        boolean known = switch (t.kind) {
            case SHEET -> true;
            case INPUT -> record.inputs().stream().anyMatch(e -> e.key().equals(t.ref));
            case STEP -> record.steps().stream().anyMatch(s -> s.symbol().equals(t.ref));
        };
        if (!known) throw new InputError(field, "\"" + code + "\"", "names no input or step on this sheet");
        return t;
    }

    /** The target as the sheet renderer takes it: an input key or step symbol, blank for the sheet. */
    public String sheetRef() { return ref; }
}
