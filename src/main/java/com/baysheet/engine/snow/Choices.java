package com.baysheet.engine.snow;

import com.baysheet.engine.InputError;

import java.util.Arrays;
import java.util.stream.Collectors;

/** Parses a snow table choice typed on a form or in JSON (case-insensitive), naming the field and the choices. */
public final class Choices {
    private Choices() {}

    public static <E extends Enum<E>> E parse(Class<E> type, String field, String text) {
        for (E e : type.getEnumConstants()) if (e.name().equalsIgnoreCase(text == null ? "" : text.trim())) return e;
        String names = Arrays.stream(type.getEnumConstants()).map(Enum::name).collect(Collectors.joining(", "));
        throw new InputError(field, text, "must be one of " + names);
    }
}
