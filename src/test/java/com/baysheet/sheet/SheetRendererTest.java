package com.baysheet.sheet;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.record.Step;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class SheetRendererTest {
    static CalcRecord beam;
    static RenderedPdf issued;
    static String text;

    private static String sq(String s) { return SheetFixtures.squash(s); }

    @BeforeAll
    static void render() {
        beam = SheetFixtures.beam();
        issued = SheetRenderer.issued(MemberSheet.of(SheetFixtures.header("Beam B1"), beam));
        text = SheetFixtures.squash(SheetFixtures.text(issued.bytes()));
    }

    @Test
    void textHoldsEveryInputWithItsShownValue() {
        for (Entry e : beam.inputs()) assertThat(text).contains(sq(e.label())).contains(sq(e.shown()));
    }

    @Test
    void textHoldsEveryStepResultAndClauseNumber() {
        for (Step s : beam.steps()) {
            assertThat(text).contains(sq(s.shown()));
            if (!s.clause().isNone()) assertThat(text).contains(sq(s.clause().ref()));
        }
        assertThat(text).contains(sq("4.7.2, Eq. 4.7-1")).contains(sq("Table 4.7-1"));
    }

    @Test
    void textHoldsEveryResultAndTheGoverningOnesSetApart() {
        for (Entry e : beam.results()) assertThat(text).contains(sq(e.shown()));
        String governing = text.substring(text.indexOf("GOVERNINGRESULTS"));
        for (String k : beam.governing()) assertThat(governing).contains(sq(beam.entry(k).label())).contains(sq(beam.entry(k).shown()));
    }

    @Test
    void textHoldsInitialsCautionsDisclaimerAndStampBox() {
        for (List<String> page : PdfText.pages(issued.bytes())) {
            assertThat(PdfText.words(PdfText.after(page, "Prepared by"))).containsExactly("JQR", "2025-05-28");
            assertThat(PdfText.words(PdfText.after(page, "Checked by"))).containsExactly("MKL", "2025-05-30");
        }
        for (Note n : beam.notes()) assertThat(text).contains(sq(n.text()));
        assertThat(text).contains("CAUTION").contains(sq("licensed professional engineer"))
                .contains(sq("adopted local building code")).contains(sq("Engineer's seal and signature"));
    }

    @Test
    void reactionsReadRaAndRbInTheTableAndTheDiagram() {
        // R1, R2 are the roof factors of Eq. 4.8-1; the reactions are R_A (left) and R_B (right)
        assertThat(text).contains(sq("Left reaction R_A")).contains(sq("Right reaction R_B"))
                .contains(sq("R_A = ")).contains(sq("R_B = "));
        assertThat(text).doesNotContain(sq("R1 = ")).doesNotContain(sq("Left reaction R1"));
    }

    @Test
    void anOverhangSheetTabulatesTheLeastReactionsAndCautionsTheUplift() {
        // 10 ft + 8 ft, 15 psf dead, 50 psf office on 10 ft: 1.2 × 270 − 1.6 × 1600 = −2,236 lb at support A
        CalcRecord r = com.baysheet.engine.Fixtures.calc(com.baysheet.engine.Fixtures.US, com.baysheet.engine.Fixtures.beam(
                new com.baysheet.engine.load.Support.Overhang(10, 8),
                List.of(new com.baysheet.engine.load.AreaStrip("office", 10, 0, 18, 15)), List.of(), Double.NaN, Double.NaN));
        String t = sq(SheetFixtures.text(SheetRenderer.issued(MemberSheet.of(SheetFixtures.header("Beam B9"), r)).bytes()));
        assertThat(t).contains(sq("Least left reaction R_A")).contains(sq("-2.24 kip")).contains(sq("Uplift at support A"))
                .contains(sq("supporting member"));
    }

    @Test
    void veraPdfFindsItPdfA1b() {
        assertThat(PdfA.failures(issued.bytes())).isEmpty();
    }

    @Test
    void everyPageCountsItselfOfTheTotal() {
        int n = SheetFixtures.pages(issued.bytes());
        assertThat(issued.pages()).isEqualTo(n).isGreaterThanOrEqualTo(2);
        List<List<String>> pages = PdfText.pages(issued.bytes());
        for (int p = 1; p <= n; p++) {
            String of = p + " of " + n;
            assertThat(PdfText.after(pages.get(p - 1), "Sheet")).as("the title block of page %d", p).isEqualTo(of);
            assertThat(pages.get(p - 1)).as("the footer of page %d", p).anySatisfy(l -> assertThat(l).endsWith(" Page " + of));
        }
    }

    @Test
    void sameInputsGiveTheSameBytesAndTheHashIsTheFilesHash() throws Exception {
        RenderedPdf again = SheetRenderer.issued(MemberSheet.of(SheetFixtures.header("Beam B1"), SheetFixtures.beam()));
        assertThat(again.bytes()).isEqualTo(issued.bytes());
        assertThat(again.sha256()).isEqualTo(issued.sha256())
                .isEqualTo(HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(issued.bytes())));
    }

    @Test
    void anotherIssueDateGivesOtherBytes() {
        SheetHeader h = SheetFixtures.header("Beam B1");
        SheetHeader later = new SheetHeader(h.firm(), h.project(), h.jobNumber(), h.subject(), h.preparedBy(), h.preparedOn(),
                h.checkedBy(), h.checkedOn(), "B", h.issueDate().plusDays(7));
        assertThat(SheetRenderer.issued(MemberSheet.of(later, beam)).sha256()).isNotEqualTo(issued.sha256());
    }

    @Test
    void bundledFontHasEverySymbolTheRecordsUse() {
        Fonts f = Fonts.create(1);
        for (char c : "²·√Σ≤≥−×ℓ†—…Δ".toCharArray()) assertThat(f.regular.charExists(c)).as("glyph %s", c).isTrue();
        for (char c : "²·√Σ≤≥−×ℓ†—…Δ".toCharArray()) assertThat(f.bold.charExists(c)).as("bold glyph %s", c).isTrue();
    }

    @Test
    void girderAndColumnSheetsRenderTheirOwnShownValues() {
        for (CalcRecord r : List.of(SheetFixtures.girder(), SheetFixtures.column())) {
            String t = sq(SheetFixtures.text(SheetRenderer.issued(MemberSheet.of(SheetFixtures.header(r.subject()), r)).bytes()));
            for (Step s : r.steps()) assertThat(t).contains(sq(s.shown()));
            for (Entry e : r.results()) assertThat(t).contains(sq(e.shown()));
        }
    }
}
