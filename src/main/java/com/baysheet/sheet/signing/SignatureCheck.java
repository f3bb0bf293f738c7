package com.baysheet.sheet.signing;

import org.bouncycastle.asn1.ASN1InputStream;
import org.bouncycastle.asn1.cms.ContentInfo;
import org.bouncycastle.cert.X509CertificateHolder;
import org.bouncycastle.cms.CMSException;
import org.bouncycastle.cms.CMSProcessableByteArray;
import org.bouncycastle.cms.CMSSignedData;
import org.bouncycastle.cms.SignerInformation;
import org.bouncycastle.cms.jcajce.JcaSimpleSignerInfoVerifierBuilder;
import org.bouncycastle.cert.jcajce.JcaX509CertificateConverter;
import org.bouncycastle.operator.OperatorCreationException;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.security.cert.CertificateException;
import java.security.cert.X509Certificate;
import java.util.Collection;

/**
 * Whether a PDF carries an intact signature over the whole file, and whose: the last signature's /ByteRange must
 * cover every byte but its own /Contents (so nothing was added after signing), the CMS signature in /Contents must
 * verify over exactly those bytes (which also checks their SHA-256 against the signed message digest), and the
 * signing certificate is compared with the office's. The file is read as bytes, not parsed as a PDF: whatever the
 * ByteRange says, only the office's key could have signed everything outside the hole, and the hole holds hex digits only.
 *
 * @param signer      the signing certificate's subject (blank when none could be read)
 * @param fingerprint its SHA-256 fingerprint (blank when none could be read)
 * @param why         for a broken or missing signature, what is wrong, in a sentence
 */
public record SignatureCheck(Status status, String signer, String fingerprint, String why) {
    public enum Status {
        /** No signature at all (a checking copy, or a file from elsewhere). */
        UNSIGNED,
        /** A signature that does not verify, or does not cover the whole file: the file changed after signing. */
        BROKEN,
        /** An intact signature by a certificate that is not the office's. */
        OTHER_KEY,
        /** An intact signature by the office's certificate over the whole file. */
        OFFICE
    }

    private static final byte[] BYTE_RANGE = "/ByteRange".getBytes(StandardCharsets.US_ASCII);
    /** A ByteRange array is four numbers: a few dozen characters; this bounds the scan past the name. */
    private static final int RANGE_TEXT = 120;

    public boolean intact() { return status == Status.OTHER_KEY || status == Status.OFFICE; }

    public static SignatureCheck of(byte[] pdf, X509Certificate office) {
        int at = lastIndexOf(pdf, BYTE_RANGE);
        if (at < 0) return new SignatureCheck(Status.UNSIGNED, "", "", "the file carries no digital signature");
        long[] r = range(pdf, at + BYTE_RANGE.length);
        if (r == null) return broken("its signature's byte range cannot be read");
        if (r[0] != 0 || r[1] <= 0 || r[2] <= r[1] || r[3] < 0 || r[2] + r[3] != pdf.length)
            return broken("its signature does not cover the whole file: something was added or cut after signing");
        int holeStart = (int) r[1], holeEnd = (int) r[2];
        if (pdf[holeStart] != '<' || pdf[holeEnd - 1] != '>') return broken("its signature's byte range does not frame the signature");
        byte[] cms = hex(pdf, holeStart + 1, holeEnd - 1);
        if (cms == null) return broken("the signature itself is not hex digits");
        byte[] signed = new byte[holeStart + (int) r[3]];
        System.arraycopy(pdf, 0, signed, 0, holeStart);
        System.arraycopy(pdf, holeEnd, signed, holeStart, (int) r[3]);
        try {
            CMSSignedData sd = new CMSSignedData(new CMSProcessableByteArray(signed), contentInfo(cms));
            Collection<SignerInformation> signers = sd.getSignerInfos().getSigners();
            if (signers.size() != 1) return broken("its signature has " + signers.size() + " signers, not one");
            SignerInformation si = signers.iterator().next();
            @SuppressWarnings("unchecked")
            Collection<X509CertificateHolder> certs = sd.getCertificates().getMatches(si.getSID());
            if (certs.isEmpty()) return broken("its signature does not carry the signing certificate");
            X509Certificate cert = new JcaX509CertificateConverter().getCertificate(certs.iterator().next());
            String subject = cert.getSubjectX500Principal().getName(), fp = OfficeKey.fingerprint(cert);
            if (!si.verify(new JcaSimpleSignerInfoVerifierBuilder().build(cert)))
                return new SignatureCheck(Status.BROKEN, subject, fp, "its signature does not match its content: the file changed after signing");
            boolean ours = office != null && fp.equals(OfficeKey.fingerprint(office));
            return new SignatureCheck(ours ? Status.OFFICE : Status.OTHER_KEY, subject, fp,
                    ours ? "" : "it was signed with a key that is not this office's");
        } catch (CMSException e) {
            // a content digest that differs is reported this way by BouncyCastle, as is a signature that cannot be parsed
            return broken("its signature does not match its content: the file changed after signing");
        } catch (IOException e) {
            return broken("its signature cannot be read");
        } catch (CertificateException | OperatorCreationException | RuntimeException e) {
            return broken("its signature cannot be read");
        }
    }

    /** The CMS at the head of /Contents: the hole is padded with zeros past its end, which a strict reader refuses as extra data. */
    public static ContentInfo contentInfo(byte[] contents) throws IOException {
        try (ASN1InputStream in = new ASN1InputStream(contents)) {
            return ContentInfo.getInstance(in.readObject());
        }
    }

    private static SignatureCheck broken(String why) { return new SignatureCheck(Status.BROKEN, "", "", why); }

    /** The four numbers of {@code [a b c d]} starting at {@code from}, or null. */
    private static long[] range(byte[] b, int from) {
        int i = from, end = Math.min(b.length, from + RANGE_TEXT);
        while (i < end && isSpace(b[i])) i++;
        if (i >= end || b[i] != '[') return null;
        i++;
        long[] out = new long[4];
        for (int n = 0; n < 4; n++) {
            while (i < end && isSpace(b[i])) i++;
            int start = i;
            long v = 0;
            while (i < end && b[i] >= '0' && b[i] <= '9' && i - start < 12) v = v * 10 + (b[i++] - '0');
            if (i == start || v > Integer.MAX_VALUE) return null;
            out[n] = v;
        }
        while (i < end && isSpace(b[i])) i++;
        return i < end && b[i] == ']' ? out : null;
    }

    private static byte[] hex(byte[] b, int from, int to) {
        if ((to - from) % 2 != 0) return null;
        byte[] out = new byte[(to - from) / 2];
        for (int i = 0; i < out.length; i++) {
            int hi = Character.digit(b[from + 2 * i], 16), lo = Character.digit(b[from + 2 * i + 1], 16);
            if (hi < 0 || lo < 0) return null;
            out[i] = (byte) (hi << 4 | lo);
        }
        return out;
    }

    private static boolean isSpace(byte c) { return c == ' ' || c == '\n' || c == '\r' || c == '\t' || c == '\f' || c == 0; }

    private static int lastIndexOf(byte[] b, byte[] what) {
        outer:
        for (int i = b.length - what.length; i >= 0; i--) {
            for (int j = 0; j < what.length; j++) if (b[i + j] != what[j]) continue outer;
            return i;
        }
        return -1;
    }
}
