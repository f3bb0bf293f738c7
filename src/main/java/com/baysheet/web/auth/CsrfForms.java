package com.baysheet.web.auth;

import io.javalin.http.Context;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The after-filter that gives every POST form of every HTML page the request's form token as a hidden
 * {@code _csrf} field, server-side, so that no template can forget it and no script is needed. The token
 * is URL-safe base64 (no character that needs escaping in an attribute).
 */
public final class CsrfForms {
    private static final Pattern POST_FORM = Pattern.compile("<form\\b[^>]*\\bmethod=\"post\"[^>]*>", Pattern.CASE_INSENSITIVE);

    private CsrfForms() {}

    public static void after(Context ctx) {
        String token = ctx.attribute(Access.CSRF);
        String type = ctx.res().getContentType();
        if (token == null || type == null || !type.startsWith("text/html")) return;
        String html = ctx.result();
        if (html == null || !html.contains("<form")) return;
        ctx.result(insert(html, token));
    }

    static String insert(String html, String token) {
        Matcher m = POST_FORM.matcher(html);
        String field = "<input type=\"hidden\" name=\"" + Access.CSRF_FIELD + "\" value=\"" + token + "\">";
        return m.replaceAll(r -> Matcher.quoteReplacement(r.group() + field));
    }
}
