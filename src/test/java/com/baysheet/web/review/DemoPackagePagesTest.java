package com.baysheet.web.review;

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
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The demo project's whole package, one sheet per member against one sheet per mark, counted page by page
 * (read back with PDFBox). The figures printed are those of docs/benchmarks.md.
 */
class DemoPackagePagesTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    @Test
    void oneSheetPerMarkMakesAShorterPackageThatStillCoversEveryMember() throws IOException {
        var d = server.store.results().of(server.project()).derived();
        MarkSheets marks = server.store.marks().of(server.project(), d);
        SheetHeader h = new SheetHeader("Harbor & Pine Structural", "Demo", "DEMO-1", "Project package", SheetHeader.NOT_SUBMITTED,
                null, "", null, "0", null, LocalDate.of(2026, 1, 5));
        CalcPackage perMember = FramingSheets.project(h, d, List.of());
        List<MemberSheet> sheets = marks.all().stream().map(m -> FramingSheets.typical(h, d, m.group(), m.text())).toList();
        CalcPackage perMark = FramingSheets.projectOf(h, d, List.of(), sheets);
        int before = pages(perMember), after = pages(perMark);
        System.out.printf("demo project package: %d members, %d sheets, %d pages per member; %d marks, %d sheets, %d pages per mark%n",
                d.members().size(), perMember.sheets().size(), before, marks.all().size(), perMark.sheets().size(), after);
        for (String prefix : List.of("B", "GB", "G", "C"))
            System.out.printf("  %s: %d marks for %d members%n", prefix,
                    marks.all().stream().filter(m -> m.mark().prefix().equals(prefix)).count(),
                    marks.all().stream().filter(m -> m.mark().prefix().equals(prefix)).mapToInt(m -> m.group().members().size()).sum());
        assertThat(perMark.sheets()).hasSize(marks.all().size()).hasSizeLessThan(perMember.sheets().size());
        assertThat(marks.all().stream().mapToInt(m -> m.group().members().size()).sum()).isEqualTo(d.members().size());
        assertThat(after).isLessThan(before);
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
