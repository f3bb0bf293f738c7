package com.baysheet.sheet;

import com.baysheet.framing.Derivation;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberLabel;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;
import com.baysheet.framing.model.SelfWeights;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The framing plan sheets of a package: one per level, labelled, dimensioned, with legend and north arrow, PDF/A-1b. */
class FramingPlanSheetTest {
    static Derived building;
    static CalcPackage project;
    static RenderedPdf pdf;
    static List<String> pages;

    /** Four bays by two with an opening, a cantilever slab on the south edge and a cladding line load on line 1. */
    static Derived planned() {
        Grid g = new Grid(new GridAxis("x", List.of("1", "2", "3", "4", "5"), List.of(30.0, 25.5, 30.0, 28.0 + 1.0 / 24)),
                new GridAxis("y", List.of("A", "B", "C"), List.of(25.0, 22.0)));
        List<Bay> floor = new ArrayList<>(), roof = new ArrayList<>();
        for (int c = 0; c < 4; c++)
            for (int r = 0; r < 2; r++) {
                Bay b = c == 1 && r == 1 ? Bay.opening(c, r) : Bay.floor(c, r, r == 0 && c == 3 ? "office-corridor" : "office", 65, new Framing(Direction.X, 1));
                if (r == 0 && c == 0) b = b.withCantilever(Side.SOUTH, 6);
                floor.add(b);
                roof.add(Bay.floor(c, r, "roof-ordinary", 25, new Framing(Direction.X, 1)));
            }
        Building b = new Building("Elm Street Offices", SheetFixtures.US, g,
                List.of(Level.floor("Level 2", 14, floor), Level.roof("Roof", 28, 0.25, roof)))
                .withSelfWeights(SelfWeights.NONE)
                .withLineLoads(List.of(GridLineLoad.dead("Level 2", true, 0, 0, 2, "Cladding", 250)));
        return Derivation.derive(b);
    }

    @BeforeAll
    static void render() {
        building = planned();
        CalcPackage whole = FramingSheets.project(SheetFixtures.header("Project"), building, List.of());
        // the plans and summaries of the whole project with one member sheet and one take-down: a short PDF to validate
        project = new CalcPackage(whole.header(), whole.title(), whole.criteria(), whole.sheets().subList(0, 1),
                whole.takeDowns().subList(0, 1), List.of(), List.of(), whole.plans(), whole.schedules(), whole.submittal());
        pdf = PackageRenderer.render(project);
        pages = SheetFixtures.pageTexts(pdf.bytes());
        if (System.getProperty("baysheet.keepPdf") != null) write(pdf.bytes());
    }

    private static void write(byte[] b) {
        try {
            java.nio.file.Files.write(java.nio.file.Path.of(System.getProperty("baysheet.keepPdf")), b);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** The page (from 0) whose title block names the level's framing plan. */
    static int planPage(String level) {
        for (int p = 0; p < pages.size(); p++)
            if (pages.get(p).contains("Framing plan, " + level) && !pages.get(p).contains("Index of sheets")) return p;
        throw new AssertionError("no plan sheet for " + level);
    }

    @Test
    void everyLevelHasItsPlanSheetAfterTheIndexWithEveryMemberLabelled() {
        assertThat(project.plans()).extracting(FramingPlan::level).containsExactly("Roof", "Level 2");
        int first = planPage("Roof");
        String roof = SheetFixtures.squash(pages.get(first)), level2 = SheetFixtures.squash(pages.get(planPage("Level 2")));
        assertThat(planPage("Level 2")).isEqualTo(first + 1);
        assertThat(roof).contains("Framingplan,Roof").contains("Legend");
        assertThat(level2).contains("Framingplan,Level2");
        for (DerivedMember m : building.onLevel("Level 2")) assertThat(level2).contains(SheetFixtures.squash(MemberLabel.of(m)));
        // grid names and the spacings in feet and inches, the overall length too
        assertThat(level2).contains("30'-0\"").contains("25'-6\"").contains("28'-01/2\"").contains("113'-61/2\"").contains("47'-0\"");
        assertThat(level2).contains("cantileverslab6'-0\"").contains("opening").contains("Cladding:D250plf").contains("N");
        assertThat(level2).contains("Offices").doesNotContain("office-corridor");
    }

    @Test
    void aWidePlanIsOnALandscapePageAndThePagesAfterItAreUprightAgain() throws IOException {
        try (PDDocument d = Loader.loadPDF(pdf.bytes())) {
            PDPage plan = d.getPage(planPage("Level 2")), after = d.getPage(planPage("Level 2") + 1);
            assertThat(landscape(plan)).isTrue();
            assertThat(landscape(after)).isFalse();
        }
    }

    /** As the page is viewed: its media box, turned by its rotation. */
    private static boolean landscape(PDPage p) {
        boolean wide = p.getMediaBox().getWidth() > p.getMediaBox().getHeight();
        return p.getRotation() % 180 == 0 ? wide : !wide;
    }

    @Test
    void theIndexListsThePlansAndTheLoadSummaries() {
        String index = SheetFixtures.squash(String.join("", pages.subList(1, planPage("Roof"))));
        assertThat(index).contains("Framingplan,Roof").contains("Framingplan,Level2").contains("Loadsummaries");
    }

    @Test
    void thePackageWithPlansIsStillPdfA1b() {
        assertThat(PdfA.failures(pdf.bytes())).isEmpty();
    }

    @Test
    void aPointLoadOnThePlanIsDrawnWithItsTextAndInTheLegend() {
        FramingPlan p = project.plans().get(1);
        FramingPlan with = new FramingPlan(p.level(), p.system(), p.gridLines(), p.bays(), p.openings(), p.cantilevers(), p.members(),
                p.lineLoads(), List.of(new FramingPlan.LoadPoint(45, 12.5, "Tank P1: D 4.00 kip")));
        CalcPackage one = new CalcPackage(project.header(), project.title(), project.criteria(), project.sheets(), List.of(), List.of(), List.of(),
                List.of(with), List.of(), project.submittal());
        String text = SheetFixtures.squash(String.join("", SheetFixtures.pageTexts(PackageRenderer.render(one).bytes())));
        assertThat(text).contains("TankP1:D4.00kip").contains("pointload(unfactored)");
    }

    @Test
    void lengthsAreDimensionedAsDrawingsWriteThem() {
        assertThat(PlanLengths.of(25.5, com.baysheet.engine.units.UnitSystem.US)).isEqualTo("25'-6\"");
        assertThat(PlanLengths.of(0.5 / 12, com.baysheet.engine.units.UnitSystem.US)).isEqualTo("0'-0 1/2\"");
        assertThat(PlanLengths.of(10 + 3.375 / 12, com.baysheet.engine.units.UnitSystem.US)).isEqualTo("10'-3 3/8\"");
        assertThat(PlanLengths.of(11.99999, com.baysheet.engine.units.UnitSystem.US)).isEqualTo("12'-0\"");
        assertThat(PlanLengths.of(7.5, com.baysheet.engine.units.UnitSystem.SI)).isEqualTo("7500");
    }
}
