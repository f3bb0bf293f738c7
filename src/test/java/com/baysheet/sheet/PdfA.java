package com.baysheet.sheet;

import org.verapdf.pdfa.Foundries;
import org.verapdf.pdfa.PDFAParser;
import org.verapdf.pdfa.PDFAValidator;
import org.verapdf.gf.foundry.VeraGreenfieldFoundryProvider;
import org.verapdf.pdfa.flavours.PDFAFlavour;
import org.verapdf.pdfa.results.TestAssertion;
import org.verapdf.pdfa.results.ValidationResult;

import java.io.ByteArrayInputStream;
import java.util.List;

/** veraPDF's PDF/A-1b verdict on a PDF: the failed rules, empty when it complies. */
public final class PdfA {
    private PdfA() {}

    static {
        VeraGreenfieldFoundryProvider.initialise();
    }

    public static List<String> failures(byte[] pdf) {
        PDFAFlavour flavour = PDFAFlavour.fromString("1b");
        try (PDFAParser parser = Foundries.defaultInstance().createParser(new ByteArrayInputStream(pdf), flavour);
             PDFAValidator validator = Foundries.defaultInstance().createValidator(flavour, false)) {
            ValidationResult result = validator.validate(parser);
            if (result.isCompliant()) return List.of();
            return result.getTestAssertions().stream()
                    .filter(a -> a.getStatus() == TestAssertion.Status.FAILED)
                    .map(a -> a.getRuleId().getClause() + "-" + a.getRuleId().getTestNumber() + ": " + a.getMessage())
                    .distinct().toList();
        } catch (Exception e) {
            throw new IllegalStateException("veraPDF could not validate", e);
        }
    }
}
