package com.baysheet.sheet;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.LiveShare;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/** Headers, records and a small building shared by the sheet tests, and PDF text read back with PDFBox. */
final class SheetFixtures {
    private SheetFixtures() {}

    static final CalcContext US = CalcContext.of(UnitSystem.US);

    static SheetHeader header(String subject) {
        return new SheetHeader("Harbor & Pine Structural", "Elm Street Offices", "2024-117", subject,
                "JQR", LocalDate.of(2025, 5, 28), "MKL", LocalDate.of(2025, 5, 30), "A", LocalDate.of(2025, 6, 2));
    }

    static SheetHeader unchecked(String subject) {
        return new SheetHeader("Harbor & Pine Structural", "Elm Street Offices", "2024-117", subject,
                "JQR", LocalDate.of(2025, 5, 28), "", null, "A", LocalDate.of(2025, 6, 2));
    }

    static CalcRecord beam() {
        return MemberCalculation.calculate(US, MemberInput.beam("Beam B1", MemberKind.INTERIOR_BEAM, new Support.Simple(30),
                List.of(new AreaStrip("office", 10, 0, 30, 65)))).record();
    }

    /** An overhanging girder with two beam reactions on it: point loads, a negative moment and a second dimension. */
    static CalcRecord girder() {
        PointLoad p1 = new PointLoad(8, 9750, List.of(new LiveShare("office", false, 7500)), List.of(new AreaShare("office", 150)));
        PointLoad p2 = new PointLoad(16, 9750, List.of(new LiveShare("office", false, 7500)), List.of(new AreaShare("office", 150)));
        return MemberCalculation.calculate(US, new MemberInput("Girder G1", MemberKind.INTERIOR_BEAM, new Support.Overhang(25, 6), 1,
                List.of(new AreaStrip("office", 2, 0, 31, 65)), List.of(), List.of(p1, p2), 50, Double.NaN, Double.NaN, false)).record();
    }

    static CalcRecord column() {
        return MemberCalculation.calculate(US, MemberInput.column("Column C/2", MemberKind.INTERIOR_COLUMN, 3,
                List.of(new com.baysheet.engine.load.AreaLoad("office", 900, 65)))).record();
    }

    /** Three bays by two, an office floor under a roof, infill beams spanning in x. */
    static Derived building() { return building(US); }

    /** The same building in the given project context (another floor reduction method, say). */
    static Derived building(CalcContext ctx) {
        Grid g = new Grid(new GridAxis("x", List.of("1", "2", "3", "4"), List.of(30.0, 30.0, 30.0)),
                new GridAxis("y", List.of("A", "B", "C"), List.of(25.0, 25.0)));
        List<Bay> floor = new ArrayList<>(), roof = new ArrayList<>();
        for (int c = 0; c < 3; c++)
            for (int r = 0; r < 2; r++) {
                floor.add(Bay.floor(c, r, "office", 65, new Framing(Direction.X, 2)));
                roof.add(Bay.floor(c, r, "roof-ordinary", 25, new Framing(Direction.X, 2)));
            }
        Building b = new Building("Elm Street Offices", ctx, g,
                List.of(Level.floor("Level 2", 14, floor), Level.roof("Roof", 28, 0.25, roof)));
        return Derivation.derive(b);
    }

    static String text(byte[] pdf) {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            return new PDFTextStripper().getText(d);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Text without any white space: table cells wrap wherever their width falls, so compare the characters alone. */
    static String squash(String s) { return s.replaceAll("\\s+", ""); }

    static String page(byte[] pdf, int page) {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            PDFTextStripper s = new PDFTextStripper();
            s.setStartPage(page);
            s.setEndPage(page);
            return s.getText(d);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The text of every page, the document loaded once. */
    static List<String> pageTexts(byte[] pdf) {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            List<String> out = new ArrayList<>();
            PDFTextStripper s = new PDFTextStripper();
            for (int p = 1; p <= d.getNumberOfPages(); p++) {
                s.setStartPage(p);
                s.setEndPage(p);
                out.add(s.getText(d));
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static int pages(byte[] pdf) {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            return d.getNumberOfPages();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
