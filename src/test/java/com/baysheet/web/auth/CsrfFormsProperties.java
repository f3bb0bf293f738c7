package com.baysheet.web.auth;

import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

import java.util.List;
import java.util.Random;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The form token goes into every POST form and nowhere else, whatever the page: the search that looks only at
 * tags starting with an f gives the page that looking at every tag gives (the plain reading, kept here as the oracle).
 */
class CsrfFormsProperties {
    private static final String TOKEN = "tok-EN_123";
    private static final String FIELD = "<input type=\"hidden\" name=\"" + Access.CSRF_FIELD + "\" value=\"" + TOKEN + "\">";
    private static final Pattern POST_FORM = Pattern.compile("<form\\b[^>]*\\bmethod=\"post\"[^>]*>", Pattern.CASE_INSENSITIVE);
    private static final List<String> PIECES = List.of("<form method=\"post\" action=\"/a\">", "<FORM METHOD=\"POST\">",
            "<Form class=\"x\" method=\"post\">", "<form method=\"get\">", "<form>", "<formx method=\"post\">", "<footer>",
            "<fieldset>", "<figure>", "<F", "<f", "<", ">", "</form>", "<a href=\"/m\">", "<line x1=\"1\"/>", "text × ≤ —",
            "<svg viewBox=\"0 0 1 1\">", "<title>F1</title>", "method=\"post\"", "<input name=\"q\">");

    @Property(tries = 400)
    void everyPostFormGetsTheTokenAndNothingElseDoes(@ForAll long seed) {
        Random rnd = new Random(seed);
        StringBuilder page = new StringBuilder();
        for (int k = rnd.nextInt(60); k > 0; k--) page.append(PIECES.get(rnd.nextInt(PIECES.size())));
        String html = page.toString();
        assertThat(CsrfForms.insert(html, TOKEN)).as(html).isEqualTo(everyTag(html));
    }

    @Example
    void aPostFormInAnyCaseGetsTheFieldAndAGetFormDoesNot() {
        String html = "<p>x</p><FORM METHOD=\"POST\" action=\"/a\"><input></form><form method=\"get\"></form>";
        assertThat(CsrfForms.insert(html, TOKEN)).isEqualTo(
                "<p>x</p><FORM METHOD=\"POST\" action=\"/a\">" + FIELD + "<input></form><form method=\"get\"></form>");
    }

    /** The token inserted by looking at every tag of the page in turn. */
    private static String everyTag(String html) {
        StringBuilder out = new StringBuilder();
        int from = 0;
        for (int at = next(html, 0); at >= 0; at = next(html, from)) {
            int end = html.indexOf('>', at);
            if (end < 0) break;
            out.append(html, from, end + 1);
            if (POST_FORM.matcher(html.substring(at, end + 1)).matches()) out.append(FIELD);
            from = end + 1;
        }
        return out.append(html, from, html.length()).toString();
    }

    private static int next(String html, int from) {
        for (int at = html.indexOf('<', from); at >= 0; at = html.indexOf('<', at + 1))
            if (html.regionMatches(true, at, "<form", 0, 5)) return at;
        return -1;
    }
}
