package com.baysheet.web.review;

import com.baysheet.web.Html;
import com.baysheet.web.JsonBody;
import com.baysheet.web.TestLogin.Client;
import com.fasterxml.jackson.databind.JsonNode;
import org.jsoup.nodes.Element;

import java.util.List;
import java.util.Map;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/** Reading what a test needs from the rendered HTML, parsed as HTML (see {@link Html}), and a job's state as JSON. */
final class Pages {
    private Pages() {}

    /** The value of the {@code version} field of the (first) form whose action ends with this suffix. */
    static String version(String html, String actionSuffix) {
        Element form = Html.parse(html).selectFirst("form[action$=" + actionSuffix + "]");
        if (form == null) throw new AssertionError("no form posting to ..." + actionSuffix + " on the page");
        Element v = form.selectFirst("input[name=version]");
        if (v == null) throw new AssertionError("no version field in the form posting to ..." + actionSuffix);
        return v.val();
    }

    /** The first group of the first match of a pattern in what the page shows (its text, not its markup). */
    static String first(String html, String regex) {
        Matcher m = Pattern.compile(regex).matcher(Html.shown(html));
        if (!m.find()) throw new AssertionError("nothing the page shows matches " + regex);
        return m.group(1);
    }

    /** The sheet's state as its page states it. */
    static String state(String html) {
        return Html.text(html, "dd#state");
    }

    /** The form token of the page's (first) post form. */
    static String token(String html) {
        return Html.one(html, "form[method=post] input[name=_csrf]").val();
    }

    /** Submits (as the engineer), approves and issues (as the checker) the sheet at {@code sheet} through its page's forms. */
    static void submitApproveIssue(Client eng, Client chk, String sheet, String description) {
        String html = eng.get(sheet).body();
        assertThat(eng.post(sheet + "/submit", List.of(Map.entry("version", version(html, "/submit")))).statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/approve", List.of(Map.entry("version", version(html, "/approve")))).statusCode()).isEqualTo(303);
        html = chk.get(sheet).body();
        assertThat(chk.post(sheet + "/issue", List.of(Map.entry("version", version(html, "/issue")),
                Map.entry("description", description))).statusCode()).isEqualTo(303);
    }

    /** A package job's state as its JSON says it ({@code done}, {@code total}, {@code finished}, {@code cancelled}, {@code error}). */
    static JsonNode jobState(Client c, String job) {
        return JsonBody.of(c.get(job + "?format=json"));
    }

    /** Waits, bounded (a minute), for the package job at {@code job} to finish and gives its last state; fails if it never does. */
    static JsonNode finished(Client c, String job) throws InterruptedException {
        JsonNode state = jobState(c, job);
        for (int i = 0; i < 600 && !state.path("finished").asBoolean(); i++) {
            Thread.sleep(100);
            state = jobState(c, job);
        }
        assertThat(state.path("finished").asBoolean()).as("the job finished within a minute: %s", state).isTrue();
        return state;
    }
}
