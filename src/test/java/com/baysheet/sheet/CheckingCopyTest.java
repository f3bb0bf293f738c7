package com.baysheet.sheet;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class CheckingCopyTest {
    static final CalcRecord girder = SheetFixtures.girder();
    static final List<Markup> markups = List.of(
            new Markup("f", "MKL", "Confirm K_LL: is this girder on an edge?", false,
                    List.of(new Markup.Reply("JQR", "Interior: see the key plan."))),
            new Markup("span", "MKL", "Span to the column centrelines?", true, List.of()));

    @Test
    void checkingCopyIsMarkedOnEveryPageAndListsItsMarkups() {
        RenderedPdf pdf = SheetRenderer.checking(MemberSheet.of(SheetFixtures.unchecked("Girder G1"), girder), markups);
        List<List<String>> pages = PdfText.pages(pdf.bytes());
        assertThat(pages).hasSize(pdf.pages());
        for (List<String> page : pages) {
            assertThat(page).anySatisfy(l -> assertThat(l).startsWith("Printed ").endsWith(" " + Wording.US.mark));
            assertThat(PdfText.after(page, "Checked by")).isEqualTo("not yet checked");
        }
        // the markups table: a row per markup (number, target, author, status, text), each reply on the line below it
        List<String> lines = pages.stream().flatMap(List::stream).toList();
        int table = lines.indexOf("Checker's markups");
        assertThat(table).as("the markups table's heading").isNotNegative();
        assertThat(lines.subList(table + 1, table + 5)).containsExactly("No. On By Status Markup and replies",
                "M1 f MKL OPEN Confirm K_LL: is this girder on an edge?", "JQR: Interior: see the key plan.",
                "M2 span MKL resolved Span to the column centrelines?");
        assertThat(lines).contains("Not to be sealed");
    }

    @Test
    void checkingCopyHasNoIssueDateOnlyTheDateItWasPrinted() {
        // the header says 2025-06-02; a checking copy is never an issue, so that date is the printing's
        String page = SheetFixtures.page(SheetRenderer.checking(MemberSheet.of(SheetFixtures.unchecked("Girder G1"), girder), markups).bytes(), 1);
        assertThat(page).contains("Issue date\nnot issued", "Printed 2025-06-02").doesNotContain("Issue date\n2025-06-02");
        String issued = SheetFixtures.page(SheetRenderer.issued(MemberSheet.of(SheetFixtures.header("Girder G1"), girder)).bytes(), 1);
        assertThat(issued).contains("Issue date\n2025-06-02", "ISSUED · Rev A · 2025-06-02").doesNotContain("Printed", "not issued");
    }

    @Test
    void anIssuedCopyNeedsAnIssueDate() {
        SheetHeader h = SheetFixtures.header("Girder G1").notIssued();
        assertThatThrownBy(() -> SheetRenderer.issued(MemberSheet.of(h, girder)))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("issueDate"));
    }

    @Test
    void issuedCopyCarriesNoCheckingMark() {
        RenderedPdf pdf = SheetRenderer.issued(MemberSheet.of(SheetFixtures.header("Girder G1"), girder));
        assertThat(SheetFixtures.text(pdf.bytes())).doesNotContain(Wording.US.mark).doesNotContain("Checker's markups");
    }

    @Test
    void checkingCopyIsPdfA1bAndRepeatable() {
        MemberSheet sheet = MemberSheet.of(SheetFixtures.unchecked("Girder G1"), girder);
        RenderedPdf a = SheetRenderer.checking(sheet, markups), b = SheetRenderer.checking(sheet, markups);
        assertThat(a.sha256()).isEqualTo(b.sha256());
        assertThat(PdfA.failures(a.bytes())).isEmpty();
    }

    @Test
    void anIssuedSheetMustNameItsChecker() {
        assertThatThrownBy(() -> SheetRenderer.issued(MemberSheet.of(SheetFixtures.unchecked("Girder G1"), girder)))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("checkedBy"));
    }

    @Test
    void missingHeaderFieldsAreNamed() {
        LocalDate d = LocalDate.of(2025, 6, 2);
        assertThatThrownBy(() -> new SheetHeader(" ", "P", "J", "S", "JQR", d, "", null, "A", d))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("firm"));
        assertThatThrownBy(() -> new SheetHeader("F", "P", "J", "S", "JQR", d, "", null, "A", null))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("issueDate"));
        assertThatThrownBy(() -> new SheetHeader("F", "P", "J", "S", "JQR", d, "MKL", null, "A", d))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("checkedOn"));
        assertThatThrownBy(() -> new SheetHeader("F", "P", "", "S", "JQR", d, "", null, "A", d))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("jobNumber"));
        assertThatThrownBy(() -> new Markup("f", "", "text", false, List.of()))
                .isInstanceOf(InputError.class).satisfies(e -> assertThat(((InputError) e).field()).isEqualTo("markup.author"));
    }
}
