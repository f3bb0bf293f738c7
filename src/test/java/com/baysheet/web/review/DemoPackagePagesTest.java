package com.baysheet.web.review;

import com.baysheet.framing.Derived;
import com.baysheet.project.Project;
import com.baysheet.review.MarkSheets;
import com.baysheet.sheet.CalcPackage;
import com.baysheet.sheet.FramingSheets;
import com.baysheet.sheet.MemberSheet;
import com.baysheet.sheet.PackageRenderer;
import com.baysheet.sheet.SheetHeader;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.time.LocalDate;
import java.util.Comparator;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The demo building's whole package (the largest demo project), counted page by page (read back with PDFBox):
 * before, one sheet per member with the take-downs alone (no plans or schedules); now, as the server renders a project package, one sheet
 * per mark with the criteria page, the framing plans, the schedules and the take-downs, labelled by marks. The
 * figures printed are those of docs/benchmarks.md.
 */
class DemoPackagePagesTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void oneSheetPerMarkMakesAShorterPackageThatStillCoversEveryMember() throws IOException {
        Project demo = server.demo.stream().max(Comparator.comparingInt(p -> derived(p).members().size())).orElseThrow();
        Derived d = derived(demo);
        MarkSheets marks = server.store.marks().of(demo.id(), d);
        SheetHeader h = new SheetHeader("Harbor & Pine Structural", "Demo", "DEMO-1", "Project package", SheetHeader.NOT_SUBMITTED,
                null, "", null, "0", null, LocalDate.of(2026, 1, 5));
        CalcPackage everything = FramingSheets.project(h, d, List.of());
        // before: the package of member sheets and take-downs alone, one sheet per member
        CalcPackage perMember = new CalcPackage(everything.header(), everything.title(), everything.criteria(), everything.sheets(),
                everything.takeDowns(), List.of());
        List<MemberSheet> sheets = marks.all().stream().map(m -> FramingSheets.typical(h, d, m.group(), m.text())).toList();
        CalcPackage perMark = FramingSheets.projectOf(h, d, List.of(), sheets, marks.labels())
                .withSubmittal(server.store.projects().submittals().find(demo.id()));
        int before = pages(perMember), after = pages(perMark);
        System.out.printf("demo building %s: %d members; before %d member sheets, %d pages; now %d mark sheets, %d plans, %d schedules, %d pages%n",
                demo.info().name(), d.members().size(), perMember.sheets().size(), before, perMark.sheets().size(),
                perMark.plans().size(), perMark.schedules().size(), after);
        for (String prefix : List.of("B", "GB", "G", "C"))
            System.out.printf("  %s: %d marks for %d members%n", prefix,
                    marks.all().stream().filter(m -> m.mark().prefix().equals(prefix)).count(),
                    marks.all().stream().filter(m -> m.mark().prefix().equals(prefix)).mapToInt(m -> m.group().members().size()).sum());
        assertThat(perMember.sheets()).hasSize(d.members().size());
        assertThat(perMark.sheets()).hasSize(marks.all().size()).hasSizeLessThan(perMember.sheets().size());
        assertThat(perMark.plans()).isNotEmpty();
        assertThat(perMark.schedules()).isNotEmpty();
        assertThat(marks.all().stream().mapToInt(m -> m.group().members().size()).sum()).isEqualTo(d.members().size());
        assertThat(after).isLessThan(before);
    }

    private static Derived derived(Project p) {
        return server.store.results().of(p.id()).derived();
    }

    private static int pages(CalcPackage pkg) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        int written = PackageRenderer.checking(pkg, out, PackageRenderer.Progress.NONE).pages();
        try (PDDocument doc = Loader.loadPDF(out.toByteArray())) {
            assertThat(doc.getNumberOfPages()).isEqualTo(written);
        }
        return written;
    }
}
