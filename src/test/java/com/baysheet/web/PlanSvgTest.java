package com.baysheet.web;

import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/** The plan's SVG is written by hand, so its escaping and numbers are checked here. */
class PlanSvgTest {
    @Test
    void namesFromUsersAreEscapedInTextAndLinks() {
        PlanView.Shape bay = new PlanView.Shape(10, 20, 30, 40, 0, 0, "bay", "#abc", "", "<script>alert(1)</script> & \"x\"");
        PlanView.Shape member = new PlanView.Shape(1, 2, 0, 0, 3, 4, "beam", "", "/m?a=1&b='2'", "B<1>");
        PlanView.Shape label = new PlanView.Shape(5, 5, 0, 0, 0, 0, "", "", "", "A&B");
        String svg = new PlanView(100, 80, List.of(bay), List.of(), List.of(label), List.of(member), List.of(), Map.of()).svg();
        assertThat(svg).doesNotContain("<script>").contains("&lt;script&gt;alert(1)&lt;/script&gt; &amp; &quot;x&quot;");
        assertThat(svg).contains("href=\"/m?a=1&amp;b=&#39;2&#39;\"").contains("<title>B&lt;1&gt;</title>").contains(">A&amp;B</text>");
        assertThat(svg).startsWith("<svg").endsWith("</svg>").contains("viewBox=\"0 0 100 80\"");
    }

    @Test
    void numbersAreWrittenToATenthOfAPixel() {
        assertThat(PlanSvg.n(12)).isEqualTo("12");
        assertThat(PlanSvg.n(12.345)).isEqualTo("12.3");
        assertThat(PlanSvg.n(-0.26)).isEqualTo("-0.3");
        assertThat(PlanSvg.n(-3.5)).isEqualTo("-3.5");
        assertThat(PlanSvg.n(0.04)).isEqualTo("0");
    }

    @Test
    void aMemberWithWidthIsARectangleAndOneWithoutIsALine() {
        PlanView.Shape col = new PlanView.Shape(1, 1, 4, 4, 0, 0, "column", "", "/c", "C");
        PlanView.Shape beam = new PlanView.Shape(0, 0, 0, 0, 9, 0, "beam", "", "/b", "B");
        String svg = new PlanView(10, 10, List.of(), List.of(), List.of(), List.of(col, beam), List.of(), Map.of()).svg();
        assertThat(svg).contains("<rect x=\"1\" y=\"1\" width=\"4\" height=\"4\" class=\"member column\"/>")
                .contains("<line x1=\"0\" y1=\"0\" x2=\"9\" y2=\"0\" class=\"member beam\"/>");
    }

    @Test
    void aLineLoadIsAThickLineWithItsLabelEscaped() {
        PlanView.Shape wall = new PlanView.Shape(10, 20, 0, 0, 10, 60, "line-load", "none", null, "Wall <A&B>");
        String svg = new PlanView(100, 80, List.of(), List.of(), List.of(), List.of(), List.of(), Map.of(), List.of(wall)).svg();
        assertThat(svg).contains("<line x1=\"10\" y1=\"20\" x2=\"10\" y2=\"60\" class=\"line-load\"/>")
                .contains("<text x=\"18\" y=\"40\" text-anchor=\"start\">Wall &lt;A&amp;B&gt;</text>").doesNotContain("<A&B>");
    }
}
