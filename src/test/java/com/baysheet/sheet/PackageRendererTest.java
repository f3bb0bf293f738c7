package com.baysheet.sheet;

import com.baysheet.engine.InputError;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class PackageRendererTest {
    static Derived building;
    static CalcPackage project;
    static RenderedPdf pdf;
    static String text;
    static List<String> pages;

    @BeforeAll
    static void render() {
        building = SheetFixtures.building();
        project = FramingSheets.project(SheetFixtures.header("Project"), building,
                List.of(new Revision("0", LocalDate.of(2025, 4, 1), "Issued for coordination", "JQR")));
        pdf = PackageRenderer.render(project);
        pages = SheetFixtures.pageTexts(pdf.bytes());
        text = SheetFixtures.squash(String.join("", pages));
    }

    @Test
    void coverCriteriaIndexSheetsTakeDownsAndRevisionLogAreAllThere() {
        String cover = SheetFixtures.squash(pages.get(0)), criteria = SheetFixtures.squash(pages.get(1));
        assertThat(cover).contains("Engineerofrecord").contains("Engineer'ssealandsignature").doesNotContain("Occupanciesandloadsused");
        assertThat(criteria).contains("Designcriteria").contains("ASCE7-16").contains("Offices").contains("Partitionallowance")
                .contains("LRFD2:1.2D+1.6L+0.5Lr").contains("ASD4:D+0.75L+0.75Lr").contains("Selfweights").contains("Buildingcode");
        assertThat(SheetFixtures.squash(pages.get(2))).contains("Indexofsheets");
        for (DerivedMember m : building.members()) assertThat(text).contains(SheetFixtures.squash(m.name()));
        assertThat(text).contains("Columntake-downatgrid").contains("Revisionlog").contains("Issuedforcoordination");
    }

    @Test
    void sheetsComeGroupedByLevelThenKind() {
        List<String> order = project.sheets().stream().map(s -> s.level() + "|" + s.group()).distinct().toList();
        List<String> seen = new ArrayList<>();
        for (MemberSheet s : project.sheets()) {
            String key = s.level() + "|" + s.group();
            if (seen.isEmpty() || !seen.get(seen.size() - 1).equals(key)) seen.add(key);
        }
        assertThat(seen).isEqualTo(order);
    }

    @Test
    void indexGivesTheSheetEachMemberStartsOn() {
        MemberSheet first = project.sheets().get(0);
        int start = -1;
        for (int p = 4; p <= pages.size() && start < 0; p++)
            if (!pages.get(p - 1).contains("Index of sheets") && pages.get(p - 1).contains(first.record().subject())) start = p;
        String index = String.join("\n", pages.subList(2, start - 1));
        assertThat(start).isGreaterThan(3);
        assertThat(index).containsPattern("(?m)^" + start + " " + java.util.regex.Pattern.quote(first.record().subject()));
    }

    @Test
    void everyPageSaysNOfTheTotal() {
        int n = pages.size();
        assertThat(pdf.pages()).isEqualTo(n);
        for (int p = 1; p <= n; p++) assertThat(pages.get(p - 1)).contains("Page " + p + " of " + n).contains(p + " of " + n);
    }

    @Test
    void streamedBytesEqualTheHeldOnesAndProgressCountsEverySheet() {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        List<Integer> done = new ArrayList<>();
        StreamedPdf s = PackageRenderer.render(project, out, (d, total) -> done.add(d));
        assertThat(out.toByteArray()).isEqualTo(pdf.bytes());
        assertThat(s.sha256()).isEqualTo(pdf.sha256());
        assertThat(s.length()).isEqualTo(pdf.bytes().length);
        assertThat(done).hasSize(project.sheets().size()).endsWith(project.sheets().size());
    }

    @Test
    void veraPdfFindsThePackagePdfA1b() {
        assertThat(PdfA.failures(pdf.bytes())).isEmpty();
    }

    @Test
    void levelPackageHoldsOnlyThatLevel() {
        CalcPackage level = FramingSheets.level(SheetFixtures.header("Level 2"), building, "Level 2", List.of());
        assertThat(level.sheets()).allMatch(s -> s.level().equals("Level 2")).isNotEmpty();
        assertThat(PackageRenderer.render(level).pages()).isLessThan(pdf.pages());
    }

    @Test
    void packageOfNothingIsRefusedNamingTheField() {
        assertThatThrownBy(() -> new CalcPackage(SheetFixtures.header("P"), "Empty", project.criteria(), List.of(), List.of(), List.of()))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("sheets"));
        assertThatThrownBy(() -> FramingSheets.level(SheetFixtures.header("P"), building, "Level 9", List.of()))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("level"));
        assertThatThrownBy(() -> FramingSheets.member(SheetFixtures.header("P"), building, "nope"))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("member"));
    }

    @Test
    void aCheckingCopyOfAPackageSaysItIsNotIssuedAndLeavesNoBlankSignature() {
        CalcPackage level = FramingSheets.level(SheetFixtures.unchecked("Level"), building, "Level 2", List.of());
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PackageRenderer.checking(level, out, PackageRenderer.Progress.NONE);
        List<String> copy = SheetFixtures.pageTexts(out.toByteArray());
        assertThat(copy.get(0)).contains("Revision A, not issued: checking copy printed 2025-06-02", "Issue date\nnot issued")
                .doesNotContainPattern("issued \\d{4}-");
        String log = copy.get(copy.size() - 1);
        assertThat(log).contains("Revision log", "Not issued: checking copy printed on this date").doesNotContainPattern("(?m)/\\s*$");
    }

    @Test
    void aCheckingCopyOfARevisionIssuedBeforeSaysWhenAndThatItIsNotAnIssue() {
        CalcPackage level = FramingSheets.level(SheetFixtures.header("Level"), building, "Level 2",
                List.of(new Revision("A", LocalDate.of(2025, 6, 1), "First issue", "JQR / MKL")));
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        PackageRenderer.checking(level, out, PackageRenderer.Progress.NONE);
        assertThat(SheetFixtures.pageTexts(out.toByteArray()).get(0))
                .contains("Revision A, issued 2025-06-01; this checking copy, printed 2025-06-02, is not an issue", "Issue date\nnot issued");
    }

    @Test
    void eachMemberPageStatesItsOwnHeaderAndTheBandThePackagesIssue() {
        SheetHeader pkg = SheetFixtures.header("Level");
        SheetHeader unchecked = new SheetHeader(pkg.firm(), pkg.project(), pkg.jobNumber(), "x", SheetHeader.NOT_SUBMITTED, null,
                "", null, SheetHeader.NOT_ISSUED, null, pkg.printedOn());
        CalcPackage level = FramingSheets.level(pkg, building, "Level 2", List.of(), m -> unchecked);
        List<String> issued = SheetFixtures.pageTexts(PackageRenderer.render(level).bytes());
        String member = issued.stream().filter(p -> p.contains("Subject\n" + level.sheets().get(0).header().subject() + "\n")).findFirst().orElseThrow();
        assertThat(member).contains("Prepared by\nnot submitted", "Checked by\nnot yet checked", "Revision\nnot issued",
                "Issue date\nnot issued", "ISSUED · Level 2 package · Rev A · 2025-06-02").doesNotContain("MKL", "JQR");
        assertThat(issued.get(0)).contains("Revision A, issued 2025-06-02", "MKL");
    }
}
