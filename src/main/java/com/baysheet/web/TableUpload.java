package com.baysheet.web;

import io.javalin.http.Context;
import io.javalin.http.UploadedFile;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/** The text of a table sent as a file ("csv") or pasted ("csvText"), the file first; too large a file is refused. */
final class TableUpload {
    /** Far more than a grid and levels take (a few kilobytes). */
    static final long MAX_BYTES = 1_000_000;

    private TableUpload() {}

    static String text(Context ctx, Form form) {
        UploadedFile f = ctx.isMultipartFormData() ? ctx.uploadedFile("csv") : null;
        if (f != null && f.size() > 0) {
            if (f.size() > MAX_BYTES) {
                form.reject("csv", "is " + f.size() + " bytes; a table may be at most " + MAX_BYTES);
                return "";
            }
            try (InputStream in = f.content()) {
                String t = new String(in.readAllBytes(), StandardCharsets.UTF_8);
                return t.startsWith("\uFEFF") ? t.substring(1) : t;
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return form.value("csvText");
    }
}
