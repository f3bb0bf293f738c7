package com.baysheet.web;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The bay editor: each cell says what it holds (cantilever lengths, line loads along its edges, the slab span), the
 * grid is drawn to scale, a slab span past common practice is cautioned, the form keeps its values after an Apply,
 * and its script is a static file (the CSP allows no inline script).
 */
class BayEditorTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    private static String bays(String level) {
        long p = server.alder().id();
        return "/projects/" + p + "/levels/" + server.levelId(p, level) + "/bays";
    }

    @Test
    void eachCellShowsItsCantileverLengthsLineLoadsAndSlabSpan() {
        String level2 = server.get(bays("Level 2")).body();
        // the demo's south cladding runs along line A, the south edge of the A-B bays: 15 psf × 13 ft = 195 plf
        assertThat(level2).contains("Line loads: South cladding (south edge, D 195 plf)", "slab span 10.0 ft", "licensed engineer");
        assertThat(server.get(bays("Level 3")).body()).contains("cantilever north 6.00 ft");
    }

    @Test
    void theDemoGivesNoSlabSpanPastCommonPracticeAndALongOneIsCautioned() {
        assertThat(server.get(bays("Level 2")).body()).doesNotContain("id=\"slab-cautions\"");
        long p = server.alder().id();
        HttpResponse<String> r = server.post(bays("Level 1"), List.of(entry("version", String.valueOf(server.version(p))),
                entry("cells", "0,0"), entry("action", "assign"), entry("occupancy", "retail-first"), entry("deadLoad", "80"),
                entry("beams", "Y"), entry("infillBeams", "0")));
        assertThat(r.statusCode()).isEqualTo(303);
        String page = server.get(r.headers().firstValue("Location").orElseThrow()).body();
        // 30 ft bay, no infill beams: the slab spans 30 ft, past 15 ft
        assertThat(page).contains("id=\"slab-cautions\"", "beyond 15.0 ft", "A-B/1-2: the slab spans 30.0 ft", "common practice");
    }

    @Test
    void afterApplyTheFormKeepsTheValuesJustApplied() {
        long p = server.alder().id();
        HttpResponse<String> r = server.post(bays("Roof"), List.of(entry("version", String.valueOf(server.version(p))),
                entry("cells", "3,2"), entry("action", "assign"), entry("occupancy", "roof-ordinary"), entry("deadLoad", "23.5"),
                entry("beams", "X"), entry("infillBeams", "4"), entry("cantileverOccupancy", "")));
        assertThat(r.statusCode()).isEqualTo(303);
        String page = server.get(r.headers().firstValue("Location").orElseThrow()).body();
        assertThat(page).contains("id=\"deadLoad\" name=\"deadLoad\" inputmode=\"decimal\" value=\"23.5\"",
                "id=\"infillBeams\" name=\"infillBeams\" inputmode=\"numeric\" value=\"4\"", "<option value=\"X\" selected=\"selected\"");
        assertThat(page).contains("<option value=\"roof-ordinary\" selected=\"selected\"");
    }

    @Test
    void theGridIsDrawnToScaleAndItsScriptIsAStaticFile() {
        String page = server.get(bays("Level 2")).body();
        // columns 30 ft wide; rows 28, 10 and 28 ft tall: one scale both ways
        Matcher m = Pattern.compile("width:([0-9.]+)rem;height:([0-9.]+)rem").matcher(page);
        List<double[]> sizes = new java.util.ArrayList<>();
        while (m.find()) sizes.add(new double[]{Double.parseDouble(m.group(1)), Double.parseDouble(m.group(2))});
        assertThat(sizes).hasSize(12);
        double perFt = sizes.get(0)[0] / 30;
        assertThat(sizes.get(0)[1]).isCloseTo(28 * perFt, within(0.01));
        assertThat(sizes.get(4)[1]).isCloseTo(10 * perFt, within(0.01));
        assertThat(page).contains("<script src=\"/static/bays.js\" defer></script>").doesNotContain("<script>");
        String js = server.get("/static/bays.js").body();
        assertThat(js).contains("varies", "They differ in");
    }
}
