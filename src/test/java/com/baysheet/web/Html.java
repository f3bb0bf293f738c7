package com.baysheet.web;

import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;

import java.util.List;

/**
 * Reading a rendered page as HTML (jsoup), as a browser would: elements found by CSS selector, their text as a
 * reader sees it. A substring of the markup would also match text inside a comment, an attribute or a script.
 */
public final class Html {
    private Html() {}

    public static Document parse(String html) {
        return Jsoup.parse(html);
    }

    /** Every element the selector matches. */
    public static Elements all(String html, String css) {
        return parse(html).select(css);
    }

    /** The first element the selector matches; fails naming the selector when there is none. */
    public static Element one(String html, String css) {
        Element e = parse(html).selectFirst(css);
        if (e == null) throw new AssertionError("no element " + css + " on the page");
        return e;
    }

    /** The text of the first element the selector matches, whitespace as a reader sees it. */
    public static String text(String html, String css) {
        return one(html, css).text();
    }

    /** The text of every element the selector matches. */
    public static List<String> texts(String html, String css) {
        return all(html, css).eachText();
    }

    /** What the page shows: the body's text, without markup, comments, attributes or scripts. */
    public static String shown(String html) {
        return parse(html).body().text();
    }

    /** The value of the form field of this name (the first one), or an error naming it. */
    public static String field(String html, String name) {
        return one(html, "[name=\"" + name + "\"]").val();
    }
}
