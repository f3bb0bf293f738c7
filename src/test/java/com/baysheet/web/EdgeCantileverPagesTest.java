package com.baysheet.web;

import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Side;
import com.baysheet.project.Project;
import com.baysheet.project.ProjectInfo;
import com.baysheet.store.Editor;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * The bay editor's Apply with a cantilever over several bays: the slab goes to the ticked bays on that building edge,
 * the others get the rest, the page names both in plain words; a cantilever asked of interior bays alone is still refused.
 */
class EdgeCantileverPagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    /** 3 × 2 bays (lines 1-4 by A-C) and one floor, Level 2. */
    private static final String TABLE = "kind,name,spacing,elevation\nx,1,30,\nx,2,30,\nx,3,25,\nx,4,,\ny,A,25,\ny,B,25,\ny,C,,\n"
            + "level,Level 2,,14\n";

    private static long[] project(String job) {
        Project p = server.store.projects().create(Editor.DEMO, new ProjectInfo(job, "Edge block", "", "", "ASCE 7-16",
                UnitSystem.US, false, false));
        assertThat(server.post("/projects/" + p.id() + "/levels/csv", List.of(entry("version", String.valueOf(p.version())),
                entry("csvText", TABLE))).statusCode()).isEqualTo(303);
        return new long[]{p.id(), server.levelId(p.id(), "Level 2")};
    }

    private static HttpResponse<String> apply(long[] at, List<String> cells, String north) {
        List<Map.Entry<String, String>> f = new ArrayList<>(List.of(entry("version", String.valueOf(server.version(at[0]))),
                entry("action", "assign"), entry("occupancy", "office"), entry("deadLoad", "65"), entry("beams", "Y"),
                entry("infillBeams", "2"), entry("cantilevers.north", north)));
        cells.forEach(c -> f.add(entry("cells", c)));
        return server.post("/projects/" + at[0] + "/levels/" + at[1] + "/bays", f);
    }

    @Test
    void aWholeFloorsNorthCantileverLandsOnTheNorthRowAndThePageSaysWhichBaysGotIt() {
        long[] at = project("EDGE-1");
        HttpResponse<String> r = apply(at, List.of("0,0", "1,0", "2,0", "0,1", "1,1", "2,1"), "6");
        assertThat(r.statusCode()).isEqualTo(303);
        List<Bay> bays = server.store.bays().findByLevel(at[0], at[1]);
        assertThat(bays).hasSize(6).allMatch(b -> b.occupancy().equals("office") && b.deadLoad() == 65);
        assertThat(bays).filteredOn(b -> b.cantilevers().containsKey(Side.NORTH)).extracting(Bay::row).containsOnly(1).hasSize(3);
        assertThat(bays).filteredOn(b -> b.row() == 0).allMatch(b -> b.cantilevers().isEmpty());

        String page = server.get(r.headers().firstValue("Location").orElseThrow()).body();
        List<String> lines = Html.texts(page, "#cantilever-report p");
        assertThat(lines).hasSize(2);
        assertThat(lines.get(0)).isEqualTo("Cantilever slab past the north edge (6.00 ft) given to 3 bays on that edge: "
                + "B-C/1-2, B-C/2-3, B-C/3-4.");
        assertThat(lines.get(1)).startsWith("Not given to 3 bays, not on that edge").endsWith("A-B/1-2, A-B/2-3, A-B/3-4.");
        assertThat(page).contains("licensed engineer");
        // the audit entry says which bays went without (it names bays x lines first, as all its bay entries do)
        assertThat(new com.baysheet.store.review.AuditTrail(new com.baysheet.store.Sql(server.db.dataSource())).page(1, 0).get(0).detail()).contains("cantilevers only on the building edge",
                "1-2/A-B, 2-3/A-B, 3-4/A-B");
        // a reload of the plain page shows no report
        assertThat(Html.all(server.get("/projects/" + at[0] + "/levels/" + at[1] + "/bays").body(), "#cantilever-report")).isEmpty();
    }

    @Test
    void aCantileverPastAnInteriorLineIsStillRefusedAndNothingIsStored() {
        long[] at = project("EDGE-2");
        assertThat(apply(at, List.of("0,0", "1,0", "2,0", "0,1", "1,1", "2,1"), "").statusCode()).isEqualTo(303);
        long before = server.version(at[0]);
        // the south row alone, a north cantilever: the north row is framed beyond every one of them
        HttpResponse<String> r = apply(at, List.of("0,0", "1,0", "2,0"), "6");
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(Html.text(r.body(), "#error-cantilevers\\.north")).contains("must project past the building edge");
        assertThat(server.version(at[0])).isEqualTo(before);
        assertThat(server.store.bays().findByLevel(at[0], at[1])).allMatch(b -> b.cantilevers().isEmpty());
    }

    @Test
    void aMadeUpReportAddressShowsNothingWrong() {
        long[] at = project("EDGE-3");
        String base = "/projects/" + at[0] + "/levels/" + at[1] + "/bays?cantilevers.north=6&applied=";
        for (String bad : List.of("9x9-AAAA", "3x2-!!", "3x2-", "x"))
            assertThat(Html.all(server.get(base + bad).body(), "#cantilever-report")).as(bad).isEmpty();
    }
}
