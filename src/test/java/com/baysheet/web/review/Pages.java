package com.baysheet.web.review;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Reading what a test needs from the rendered HTML. */
final class Pages {
    private Pages() {}

    /** The value of the first {@code version} field of the form whose action ends with this suffix. */
    static String version(String html, String actionSuffix) {
        int at = html.indexOf(actionSuffix + "\"");
        if (at < 0) throw new AssertionError("no form posting to ..." + actionSuffix + " on the page");
        Matcher m = Pattern.compile("name=\"version\" value=\"(\\d+)\"").matcher(html);
        if (!m.find(at)) throw new AssertionError("no version field after " + actionSuffix);
        return m.group(1);
    }

    static String first(String html, String regex) {
        Matcher m = Pattern.compile(regex).matcher(html);
        if (!m.find()) throw new AssertionError("nothing matches " + regex);
        return m.group(1);
    }

    static String state(String html) {
        return first(html, "<dd id=\"state\">([^<]*)</dd>");
    }
}
