package com.baysheet.web;

import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** A kept page filled in per request, its tag, and the bounds of the pages kept. */
class KeptPageTest {
    static final KeptPage.Places PLACES = KeptPage.Places.random();

    static KeptPage page(String body) {
        return KeptPage.of("<header>" + PLACES.who() + "</header>" + PLACES.notice() + "<main>" + body
                + "<form method=\"post\"><input name=\"_csrf\" value=\"" + PLACES.token() + "\"></form></main>", PLACES);
    }

    static String filled(KeptPage p, KeptPage.Parts parts) {
        return new String(p.filled(parts), StandardCharsets.UTF_8);
    }

    @Test
    void eachPlaceTakesItsPartAndNothingElseChanges() {
        KeptPage p = page("Σ D = 12 kip — ²");
        KeptPage.Parts tess = KeptPage.Parts.of("<b>TT</b>", "", "tok1");
        assertThat(filled(p, tess)).isEqualTo("<header><b>TT</b></header><main>Σ D = 12 kip — ²"
                + "<form method=\"post\"><input name=\"_csrf\" value=\"tok1\"></form></main>");
        assertThat(filled(p, KeptPage.Parts.of("U", "<p>Saved.</p>", "t2"))).isEqualTo("<header>U</header><p>Saved.</p><main>Σ D = 12 kip — ²"
                + "<form method=\"post\"><input name=\"_csrf\" value=\"t2\"></form></main>");
        assertThat(p.size()).isEqualTo(filled(p, KeptPage.Parts.of("", "", "")).getBytes(StandardCharsets.UTF_8).length);
    }

    @Test
    void theTagMovesWithThePageAndWithEveryPartOfTheRequest() {
        KeptPage.Parts parts = KeptPage.Parts.of("TT", "", "tok1");
        String tag = page("a").etag(parts);
        assertThat(page("a").etag(parts)).isEqualTo(tag).startsWith("\"").endsWith("\"");
        assertThat(page("b").etag(parts)).isNotEqualTo(tag);
        assertThat(page("a").etag(KeptPage.Parts.of("UU", "", "tok1"))).isNotEqualTo(tag);
        assertThat(page("a").etag(KeptPage.Parts.of("TT", "Saved.", "tok1"))).isNotEqualTo(tag);
        assertThat(page("a").etag(KeptPage.Parts.of("TT", "", "tok2"))).isNotEqualTo(tag);
        // the parts are length-prefixed: moving text from one part to the next is another tag
        assertThat(page("a").etag(KeptPage.Parts.of("T", "T", "tok1"))).isNotEqualTo(page("a").etag(KeptPage.Parts.of("TT", "", "tok1")));
    }

    @Test
    void aDrawingGoesInAtItsMarkerAsItIsAndTheTagMovesWithIt() {
        String html = "<header>" + PLACES.who() + "</header><figure>" + PLACES.drawing(1) + "</figure><p>" + PLACES.drawing(0)
                + "</p><form method=\"post\"><input name=\"_csrf\" value=\"" + PLACES.token() + "\"></form>";
        java.util.List<String> drawings = java.util.List.of("<svg><a href=\"/m/1\"><title>B1 — x</title></a></svg>", "<svg/>");
        KeptPage p = KeptPage.of(html, PLACES, drawings);
        KeptPage.Parts parts = KeptPage.Parts.of("TT", "", "tok1");
        String sent = "<header>TT</header><figure><svg/></figure><p><svg><a href=\"/m/1\"><title>B1 — x</title></a></svg></p>"
                + "<form method=\"post\"><input name=\"_csrf\" value=\"tok1\"></form>";
        assertThat(filled(p, parts)).isEqualTo(sent);
        assertThat(p.size() + "TT".length() + "tok1".length()).isEqualTo(sent.getBytes(StandardCharsets.UTF_8).length);
        // the tag reads the drawings: another drawing is another page
        assertThat(KeptPage.of(html, PLACES, java.util.List.of(drawings.get(0), "<svg></svg>")).etag(parts)).isNotEqualTo(p.etag(parts));
        assertThatThrownBy(() -> KeptPage.of(html, PLACES, java.util.List.of("<svg/>"))).isInstanceOf(IllegalStateException.class);
    }

    @Test
    void aMarkerOfAnotherServerIsPlainText() {
        KeptPage.Places other = KeptPage.Places.random();
        KeptPage p = KeptPage.of("<p>" + other.who() + "</p>", PLACES);
        assertThat(filled(p, KeptPage.Parts.of("X", "", ""))).isEqualTo("<p>" + other.who() + "</p>");
    }

    @Test
    void ifNoneMatchIsReadAsAListWithWeakTagsAndTheWildcard() {
        assertThat(PageCache.matches(null, "\"a\"")).isFalse();
        assertThat(PageCache.matches("\"b\"", "\"a\"")).isFalse();
        assertThat(PageCache.matches("\"b\", \"a\"", "\"a\"")).isTrue();
        assertThat(PageCache.matches("W/\"a\"", "\"a\"")).isTrue();
        assertThat(PageCache.matches("*", "\"a\"")).isTrue();
    }

    @Test
    void theLruHoldsItsCountAndItsBytesAndKeepsNoPageLargerThanItsShare() {
        KeptPage small = page("x");
        int s = small.size();
        PageLru<String> byCount = new PageLru<>(2, 1_000_000, 1_000_000);
        byCount.put("a", small);
        byCount.put("b", small);
        byCount.get("a");
        byCount.put("c", small);
        assertThat(byCount.count()).isEqualTo(2);
        assertThat(byCount.get("b")).as("the least recently used goes first").isNull();
        assertThat(byCount.get("a")).isSameAs(small);
        assertThat(byCount.bytes()).isEqualTo(2L * s);
        PageLru<String> byBytes = new PageLru<>(100, 3L * s, 2L * s);
        for (String k : new String[] {"a", "b", "c", "d"}) byBytes.put(k, small);
        assertThat(byBytes.count()).isEqualTo(3);
        assertThat(byBytes.bytes()).isLessThanOrEqualTo(3L * s);
        byBytes.put("big", page("x".repeat(3 * s)));
        assertThat(byBytes.get("big")).as("larger than a page may be").isNull();
        assertThat(byBytes.count()).isEqualTo(3);
        byBytes.put("a", small);
        assertThat(byBytes.bytes()).as("a page kept again is counted once").isEqualTo(3L * s);
        assertThatThrownBy(() -> new PageLru<String>(0, 1, 1)).hasMessageContaining("page cache bounds");
    }
}
