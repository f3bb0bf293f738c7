package com.baysheet.sheet.signing;

import com.lowagie.text.DocumentException;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfDictionary;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.PdfSignature;
import com.lowagie.text.pdf.PdfSignatureAppearance;
import com.lowagie.text.pdf.PdfStamper;
import com.lowagie.text.pdf.PdfString;
import org.bouncycastle.asn1.DERSet;
import org.bouncycastle.asn1.cms.Attribute;
import org.bouncycastle.asn1.cms.AttributeTable;
import org.bouncycastle.asn1.cms.CMSAttributes;
import org.bouncycastle.asn1.ess.ESSCertIDv2;
import org.bouncycastle.asn1.ess.SigningCertificateV2;
import org.bouncycastle.asn1.pkcs.PKCSObjectIdentifiers;
import org.bouncycastle.cert.jcajce.JcaCertStore;
import org.bouncycastle.cms.CMSAttributeTableGenerator;
import org.bouncycastle.cms.CMSException;
import org.bouncycastle.cms.CMSProcessableByteArray;
import org.bouncycastle.cms.CMSSignedDataGenerator;
import org.bouncycastle.cms.DefaultSignedAttributeTableGenerator;
import org.bouncycastle.cms.jcajce.JcaSignerInfoGeneratorBuilder;
import org.bouncycastle.operator.OperatorCreationException;
import org.bouncycastle.operator.jcajce.JcaContentSignerBuilder;
import org.bouncycastle.operator.jcajce.JcaDigestCalculatorProviderBuilder;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.security.GeneralSecurityException;
import java.security.MessageDigest;
import java.time.Instant;
import java.util.Arrays;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TimeZone;

/**
 * Signs a finished PDF with the office's key: an invisible signature field added in an incremental update, its
 * /Contents a detached CMS SignedData (RFC 5652) over the whole file but the /Contents hole, SHA-256 with RSA, in the
 * form PDF readers check as PAdES (subfilter ETSI.CAdES.detached: ETSI EN 319 142-1, baseline B-B, with the signing
 * certificate named by the ESS signing-certificate-v2 attribute and the signing time in the dictionary's /M, not in
 * the CMS). The original bytes are kept unchanged as the file's first part, so the document's info and XMP metadata
 * stay as the renderer wrote them (PDF/A). OpenPDF lays the file out; BouncyCastle builds the CMS.
 */
public final class PdfSigner {
    public static final PdfName SUBFILTER = new PdfName("ETSI.CAdES.detached");
    /** Room for the CMS in /Contents: an RSA 3072 signature, the certificate and the attributes take under 3 KB; a
     * certificate from an outside authority with its chain may need more. */
    static final int CONTENTS_BYTES = 16_384;

    private final OfficeKey key;

    public PdfSigner(OfficeKey key) {
        this.key = key;
    }

    public OfficeKey key() { return key; }

    /** The signed file: {@code pdf} followed by the signature's update, signed at {@code at} for {@code reason}. */
    public byte[] sign(byte[] pdf, Instant at, String reason) {
        try {
            PdfReader reader = new PdfReader(pdf);
            ByteArrayOutputStream out = new ByteArrayOutputStream(pdf.length + CONTENTS_BYTES * 2 + 4096);
            PdfStamper stamper = PdfStamper.createSignature(reader, out, '\0', null, true);
            // the info dictionary and XMP stay as rendered: PDF/A wants the two to agree, and the update must not restate them
            stamper.setUpdateDocInfo(false);
            stamper.setUpdateMetadata(false);
            Calendar when = utc(at);
            PdfSignatureAppearance app = stamper.getSignatureAppearance();
            app.setSignDate(when);
            app.setReason(reason);
            PdfSignature dic = new PdfSignature(PdfName.ADOBE_PPKLITE, SUBFILTER);
            dic.setDate(new PdfDate(when));
            dic.setReason(reason);
            dic.put(PdfName.NAME, new PdfString(key.subject(), PdfString.TEXT_UNICODE));
            app.setCryptoDictionary(dic);
            Map<PdfName, Integer> hole = new HashMap<>();
            hole.put(PdfName.CONTENTS, CONTENTS_BYTES * 2 + 2);   // hex digits and the angle brackets
            app.preClose(hole);
            byte[] cms = cms(read(app.getRangeStream()));
            if (cms.length > CONTENTS_BYTES) throw new IllegalStateException("the signature (" + cms.length + " bytes) exceeds its room");
            PdfDictionary contents = new PdfDictionary();
            contents.put(PdfName.CONTENTS, new PdfString(Arrays.copyOf(cms, CONTENTS_BYTES)).setHexWriting(true));
            app.close(contents);
            return out.toByteArray();
        } catch (IOException | DocumentException e) {
            throw new IllegalStateException("could not sign the PDF", e);
        }
    }

    /** A detached SignedData over {@code signed}, carrying the office's certificate. */
    private byte[] cms(byte[] signed) {
        try {
            var digests = new JcaDigestCalculatorProviderBuilder().build();
            var signer = new JcaContentSignerBuilder("SHA256withRSA").build(key.privateKey());
            byte[] certHash = MessageDigest.getInstance("SHA-256").digest(key.encoded());
            Attribute essCert = new Attribute(PKCSObjectIdentifiers.id_aa_signingCertificateV2,
                    new DERSet(new SigningCertificateV2(new ESSCertIDv2(certHash))));
            CMSAttributeTableGenerator base = new DefaultSignedAttributeTableGenerator(new AttributeTable(essCert));
            // PAdES puts the signing time in the signature dictionary (/M) and forbids it in the CMS
            CMSAttributeTableGenerator attrs = params -> base.getAttributes(params).remove(CMSAttributes.signingTime);
            CMSSignedDataGenerator g = new CMSSignedDataGenerator();
            g.addSignerInfoGenerator(new JcaSignerInfoGeneratorBuilder(digests).setSignedAttributeGenerator(attrs)
                    .build(signer, key.certificate()));
            g.addCertificates(new JcaCertStore(List.of(key.certificate())));
            return g.generate(new CMSProcessableByteArray(signed), false).getEncoded();
        } catch (OperatorCreationException | CMSException | GeneralSecurityException | IOException e) {
            throw new IllegalStateException("could not build the signature", e);
        }
    }

    private static byte[] read(InputStream in) throws IOException {
        try (in) {
            return in.readAllBytes();
        }
    }

    private static Calendar utc(Instant at) {
        GregorianCalendar c = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
        c.setTimeInMillis(at.toEpochMilli());
        return c;
    }
}
