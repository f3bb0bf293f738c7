package com.baysheet.web.review;

import com.baysheet.TestKeys;
import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.sheet.PdfA;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.interactive.digitalsignature.PDSignature;
import org.bouncycastle.asn1.ASN1InputStream;
import org.bouncycastle.asn1.cms.ContentInfo;
import org.bouncycastle.cms.CMSProcessableByteArray;
import org.bouncycastle.cms.CMSSignedData;
import org.bouncycastle.cms.SignerInformation;
import org.bouncycastle.cms.jcajce.JcaSimpleSignerInfoVerifierBuilder;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.IOException;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.Pages.version;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * A sheet issued through the office is signed before it is stored: the stored SHA-256 is of the signed file, PDFBox
 * and BouncyCastle verify its signature with the office's certificate, it is still PDF/A, and /verify says so; a byte
 * changed inside the signed range, or a forged file written into the database with its own hash, is not verified.
 */
class SignedIssueTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();
    static byte[] issued;

    @BeforeAll
    static void issue() {
        Client eng = server.as("kira", Role.ENGINEER);
        Client chk = server.as("lars", Role.CHECKER);
        String sheet = server.sheetPath();
        eng.post(sheet + "/submit", List.of(Map.entry("version", version(eng.get(sheet).body(), "/submit"))));
        chk.post(sheet + "/approve", List.of(Map.entry("version", version(chk.get(sheet).body(), "/approve"))));
        assertThat(chk.post(sheet + "/issue", List.of(Map.entry("version", version(chk.get(sheet).body(), "/issue")),
                Map.entry("description", "First issue"))).statusCode()).isEqualTo(303);
        issued = eng.getBytes(Html.one(eng.get(sheet).body(), "a[href$=/issued.pdf]").attr("href")).body();
    }

    @Test
    void theIssuedCopyIsSignedAndItsStoredHashIsOfTheSignedFile() throws Exception {
        assertThat(server.office.review().reviews().withPdf(Tokens.sha256(issued))).hasSize(1);
        try (PDDocument doc = Loader.loadPDF(issued)) {
            List<PDSignature> sigs = doc.getSignatureDictionaries();
            assertThat(sigs).hasSize(1);
            PDSignature s = sigs.get(0);
            assertThat((long) s.getByteRange()[2] + s.getByteRange()[3]).isEqualTo(issued.length);
            CMSSignedData cms = new CMSSignedData(new CMSProcessableByteArray(s.getSignedContent(issued)), head(s.getContents(issued)));
            SignerInformation si = cms.getSignerInfos().getSigners().iterator().next();
            assertThat(si.verify(new JcaSimpleSignerInfoVerifierBuilder().build(TestKeys.key().certificate()))).isTrue();
        }
        assertThat(PdfA.failures(issued)).isEmpty();
        assertThat(text(issued)).contains("the signature attests that the file is as issued, not the engineer's seal");
    }

    @Test
    void verifySaysTheSignatureIsTheOffices() {
        Client eng = server.as("mona", Role.ENGINEER);
        String page = eng.upload("/verify", "pdf", "sheet.pdf", issued).body();
        assertThat(Html.text(page, "section#verdict h2")).isEqualTo("Matches an issued revision, signed by this office");
        assertThat(Html.text(page, "#signature")).contains("intact, made with this office's key", TestKeys.key().fingerprint());
        assertThat(Html.text(eng.get("/verify").body(), "#office-fingerprint")).isEqualTo(TestKeys.key().fingerprint());
        String firm = server.as("admin", Role.ADMINISTRATOR).get("/admin/firm").body();
        assertThat(Html.text(firm, "#signing-fingerprint")).isEqualTo(TestKeys.key().fingerprint());
    }

    @Test
    void oneByteChangedInsideTheSignedRangeFailsVerification() {
        byte[] altered = issued.clone();
        altered[issued.length / 3] ^= 0x20;
        String page = server.as("nils", Role.ENGINEER).upload("/verify", "pdf", "sheet.pdf", altered).body();
        assertThat(Html.text(page, "section#verdict h2")).isEqualTo("No match");
        assertThat(Html.text(page, "#signature")).contains("broken");
    }

    @Test
    void aForgedFileWrittenIntoTheDatabaseWithItsOwnHashIsNotVerified() throws Exception {
        // the forger rewrites the stored copy and its hash; without the key, the signature cannot follow
        byte[] forged = issued.clone();
        forged[issued.length / 3] ^= 0x20;
        String forgedSha = Tokens.sha256(forged);
        try (Connection c = server.db.dataSource().getConnection();
             PreparedStatement ps = c.prepareStatement("UPDATE sheet_revision SET pdf = ?, pdf_sha256 = ? WHERE pdf_sha256 = ?")) {
            ps.setBytes(1, forged);
            ps.setString(2, forgedSha);
            ps.setString(3, Tokens.sha256(issued));
            assertThat(ps.executeUpdate()).isEqualTo(1);
            String page = server.as("olga", Role.ENGINEER).upload("/verify", "pdf", "sheet.pdf", forged).body();
            assertThat(Html.text(page, "section#verdict h2")).startsWith("Not verified");
            assertThat(Html.text(page, "#signature")).contains("broken");
        } finally {
            try (Connection c = server.db.dataSource().getConnection();
                 PreparedStatement ps = c.prepareStatement("UPDATE sheet_revision SET pdf = ?, pdf_sha256 = ? WHERE pdf_sha256 = ?")) {
                ps.setBytes(1, issued);
                ps.setString(2, Tokens.sha256(issued));
                ps.setString(3, forgedSha);
                ps.executeUpdate();
            }
        }
    }

    private static String text(byte[] pdf) throws IOException {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            return new org.apache.pdfbox.text.PDFTextStripper().getText(d).replaceAll("\\s+", " ");
        }
    }

    private static ContentInfo head(byte[] contents) throws IOException {
        try (ASN1InputStream in = new ASN1InputStream(contents)) {
            return ContentInfo.getInstance(in.readObject());
        }
    }
}
