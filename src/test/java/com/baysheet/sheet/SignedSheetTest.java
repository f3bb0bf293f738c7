package com.baysheet.sheet;

import com.baysheet.sheet.signing.OfficeKey;
import com.baysheet.sheet.signing.PdfSigner;
import com.baysheet.sheet.signing.SignatureCheck;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.interactive.digitalsignature.PDSignature;
import org.bouncycastle.cert.X509CertificateHolder;
import org.bouncycastle.cms.CMSProcessableByteArray;
import org.bouncycastle.cms.CMSSignedData;
import org.bouncycastle.cms.SignerInformation;
import org.bouncycastle.cms.jcajce.JcaSimpleSignerInfoVerifierBuilder;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.util.Collection;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * An issued sheet signed with the office's key checks out with libraries other than the one that signed it: PDFBox
 * finds the signature and its signed bytes, BouncyCastle verifies the CMS over them with the office's certificate,
 * and veraPDF still finds the file PDF/A. One byte changed inside the signed range breaks it.
 */
class SignedSheetTest {
    @TempDir
    static Path dir;
    static OfficeKey key;
    static byte[] unsigned, signed;

    @BeforeAll
    static void sign() {
        key = OfficeKey.readOrCreate(dir.resolve("office.p12"), "pw".toCharArray(), "Harbor Structural", Clock.systemUTC());
        unsigned = SheetRenderer.issued(MemberSheet.of(SheetFixtures.header("Beam B1"), SheetFixtures.beam())).bytes();
        signed = new PdfSigner(key).sign(unsigned, Instant.parse("2026-03-02T15:00:00Z"), "Issued revision 1");
    }

    @Test
    void theSignedFileBeginsWithTheRenderedOneUnchanged() {
        assertThat(signed.length).isGreaterThan(unsigned.length);
        assertThat(java.util.Arrays.copyOf(signed, unsigned.length)).isEqualTo(unsigned);
    }

    @Test
    void pdfboxFindsOneSignatureOverTheWholeFileThatVerifiesWithTheOfficeCertificate() throws Exception {
        try (PDDocument doc = Loader.loadPDF(signed)) {
            List<PDSignature> sigs = doc.getSignatureDictionaries();
            assertThat(sigs).hasSize(1);
            PDSignature s = sigs.get(0);
            assertThat(s.getSubFilter()).isEqualTo("ETSI.CAdES.detached");
            int[] r = s.getByteRange();
            assertThat(r[0]).isZero();
            assertThat((long) r[2] + r[3]).isEqualTo(signed.length);
            byte[] content = s.getSignedContent(signed);
            CMSSignedData cms = new CMSSignedData(new CMSProcessableByteArray(content), head(s.getContents(signed)));
            SignerInformation si = cms.getSignerInfos().getSigners().iterator().next();
            assertThat(si.getDigestAlgOID()).isEqualTo("2.16.840.1.101.3.4.2.1");   // SHA-256 (RFC 5754)
            @SuppressWarnings("unchecked")
            Collection<X509CertificateHolder> carried = cms.getCertificates().getMatches(si.getSID());
            assertThat(carried.iterator().next().getEncoded()).isEqualTo(key.certificate().getEncoded());
            assertThat(si.verify(new JcaSimpleSignerInfoVerifierBuilder().build(key.certificate()))).isTrue();
        }
    }

    /** The CMS object at the head of /Contents, read with BouncyCastle's own ASN.1 reader (the rest is zero padding). */
    private static org.bouncycastle.asn1.cms.ContentInfo head(byte[] contents) throws java.io.IOException {
        try (var in = new org.bouncycastle.asn1.ASN1InputStream(contents)) {
            return org.bouncycastle.asn1.cms.ContentInfo.getInstance(in.readObject());
        }
    }

    @Test
    void theSignedSheetIsStillPdfA() {
        assertThat(PdfA.failures(signed)).isEmpty();
    }

    @Test
    void ourOwnCheckSaysTheOfficeSignedIt() {
        SignatureCheck c = SignatureCheck.of(signed, key.certificate());
        assertThat(c.status()).isEqualTo(SignatureCheck.Status.OFFICE);
        assertThat(c.fingerprint()).isEqualTo(key.fingerprint());
        assertThat(SignatureCheck.of(unsigned, key.certificate()).status()).isEqualTo(SignatureCheck.Status.UNSIGNED);
    }

    @Test
    void oneByteChangedInsideTheSignedRangeBreaksTheSignature() throws Exception {
        byte[] altered = signed.clone();
        int at = unsigned.length / 2;   // inside the first signed range: the rendered sheet itself
        altered[at] ^= 0x01;
        assertThat(SignatureCheck.of(altered, key.certificate()).status()).isEqualTo(SignatureCheck.Status.BROKEN);
        // and BouncyCastle over PDFBox's reading agrees
        try (PDDocument doc = Loader.loadPDF(signed)) {
            PDSignature s = doc.getSignatureDictionaries().get(0);
            CMSSignedData cms = new CMSSignedData(new CMSProcessableByteArray(s.getSignedContent(altered)), head(s.getContents(signed)));
            SignerInformation si = cms.getSignerInfos().getSigners().iterator().next();
            boolean ok;
            try {
                ok = si.verify(new JcaSimpleSignerInfoVerifierBuilder().build(key.certificate()));
            } catch (org.bouncycastle.cms.CMSException e) {
                ok = false;
            }
            assertThat(ok).isFalse();
        }
    }

    @Test
    void bytesAddedAfterSigningBreakTheSignature() {
        byte[] longer = java.util.Arrays.copyOf(signed, signed.length + 10);
        assertThat(SignatureCheck.of(longer, key.certificate()).status()).isEqualTo(SignatureCheck.Status.BROKEN);
    }

    @Test
    void aSignatureByAnotherKeyIsIntactButNotTheOffices() {
        OfficeKey other = OfficeKey.readOrCreate(dir.resolve("other.p12"), "pw".toCharArray(), "Someone Else", Clock.systemUTC());
        SignatureCheck c = SignatureCheck.of(new PdfSigner(other).sign(unsigned, Instant.parse("2026-03-02T15:00:00Z"), "x"),
                key.certificate());
        assertThat(c.status()).isEqualTo(SignatureCheck.Status.OTHER_KEY);
        assertThat(c.signer()).contains("Someone Else");
    }

    @Test
    void theKeyFileIsMadeOnceAndReadBackWithTheSameFingerprint() throws Exception {
        Path f = dir.resolve("again.p12");
        OfficeKey first = OfficeKey.readOrCreate(f, new char[0], "Harbor Structural", Clock.systemUTC());
        byte[] file = Files.readAllBytes(f);
        OfficeKey second = OfficeKey.readOrCreate(f, new char[0], "Harbor Structural", Clock.systemUTC());
        assertThat(second.fingerprint()).isEqualTo(first.fingerprint());
        assertThat(Files.readAllBytes(f)).isEqualTo(file);
        assertThat(first.subject()).contains("Harbor Structural");
        assertThat(first.fingerprint()).matches("([0-9A-F]{2}:){31}[0-9A-F]{2}");
        assertThat(java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(f))).isEqualTo("rw-------");
    }

    @Test
    void aWrongPasswordIsRefusedNamingTheFile() {
        Path f = dir.resolve("office.p12");
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> OfficeKey.read(f, "wrong".toCharArray()))
                .isInstanceOf(OfficeKey.Unusable.class).hasMessageContaining(f.toString());
    }
}
