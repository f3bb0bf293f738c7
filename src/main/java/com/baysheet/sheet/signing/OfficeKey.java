package com.baysheet.sheet.signing;

import org.bouncycastle.asn1.x500.X500NameBuilder;
import org.bouncycastle.asn1.x500.style.BCStyle;
import org.bouncycastle.asn1.x509.BasicConstraints;
import org.bouncycastle.asn1.x509.Extension;
import org.bouncycastle.asn1.x509.KeyUsage;
import org.bouncycastle.cert.X509v3CertificateBuilder;
import org.bouncycastle.cert.jcajce.JcaX509CertificateConverter;
import org.bouncycastle.cert.jcajce.JcaX509v3CertificateBuilder;
import org.bouncycastle.operator.OperatorCreationException;
import org.bouncycastle.operator.jcajce.JcaContentSignerBuilder;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.GeneralSecurityException;
import java.security.KeyPair;
import java.security.KeyPairGenerator;
import java.security.KeyStore;
import java.security.MessageDigest;
import java.security.PrivateKey;
import java.security.SecureRandom;
import java.security.cert.Certificate;
import java.security.cert.CertificateEncodingException;
import java.security.cert.X509Certificate;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Date;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;

/**
 * The office's signing key: an RSA private key and its certificate, read from a PKCS#12 file kept outside the data
 * folder and the database (anyone who can read the database could otherwise forge an issued sheet). When the
 * office names no file of its own, one is generated once, with a self-signed certificate naming the firm; its
 * SHA-256 fingerprint is what a building department compares with the one the office gives them.
 */
public record OfficeKey(PrivateKey privateKey, X509Certificate certificate) {
    /** A key file the server cannot use; the message is one line for the terminal. */
    public static final class Unusable extends RuntimeException {
        public Unusable(String message) { super(message); }
    }

    /** 3072 bits: NIST SP 800-57 Part 1 puts RSA 3072 at 128-bit security, good beyond 2030. */
    static final int BITS = 3072;
    /** Issued sheets are kept for decades; a reader checks the signature as of its signing time. */
    static final Duration VALID_FOR = Duration.ofDays(366L * 30);

    /** The certificate's SHA-256 fingerprint, as pairs of upper-case hex digits separated by colons. */
    public String fingerprint() { return fingerprint(certificate); }

    public static String fingerprint(X509Certificate c) {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(c.getEncoded());
            return HexFormat.ofDelimiter(":").withUpperCase().formatHex(d);
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("every Java runtime has SHA-256 and can encode its own certificate", e);
        }
    }

    /** Who the certificate names (its subject), as a person reads it. */
    public String subject() { return certificate.getSubjectX500Principal().getName(); }

    /** Reads the one private key of a PKCS#12 file. */
    public static OfficeKey read(Path file, char[] password) {
        if (!Files.isRegularFile(file)) throw new Unusable("signing key " + file + " does not exist (a PKCS#12 file, .p12)");
        try (InputStream in = Files.newInputStream(file)) {
            KeyStore ks = KeyStore.getInstance("PKCS12");
            ks.load(in, password);
            List<String> keys = new ArrayList<>();
            for (String alias : Collections.list(ks.aliases())) if (ks.isKeyEntry(alias)) keys.add(alias);
            if (keys.size() != 1)
                throw new Unusable("signing key " + file + " must hold exactly one private key, it holds " + keys.size() + " " + keys);
            Certificate c = ks.getCertificate(keys.get(0));
            if (!(c instanceof X509Certificate x)) throw new Unusable("signing key " + file + " has no X.509 certificate for its key");
            return new OfficeKey((PrivateKey) ks.getKey(keys.get(0), password), x);
        } catch (IOException e) {
            // a wrong password shows as an IOException from PKCS#12's integrity check
            throw new Unusable("signing key " + file + " cannot be read (wrong password, or not a PKCS#12 file): " + e.getMessage());
        } catch (GeneralSecurityException e) {
            throw new Unusable("signing key " + file + " cannot be read: " + e.getMessage());
        }
    }

    /**
     * The key in {@code file}, generated there first if the file does not exist yet (readable by its owner only).
     * {@code firm} is the name the new certificate carries.
     */
    public static OfficeKey readOrCreate(Path file, char[] password, String firm, Clock clock) {
        if (Files.exists(file)) return read(file, password);
        OfficeKey k = generate(firm, clock.instant());
        // another server starting beside the same folder may have made it meanwhile: then that one is the office's
        return k.write(file, password) ? k : read(file, password);
    }

    /** A new key pair and a self-signed certificate naming the firm, valid from a day before {@code now}. */
    public static OfficeKey generate(String firm, Instant now) {
        try {
            KeyPairGenerator g = KeyPairGenerator.getInstance("RSA");
            g.initialize(BITS, new SecureRandom());
            KeyPair pair = g.generateKeyPair();
            var name = new X500NameBuilder(BCStyle.INSTANCE)
                    .addRDN(BCStyle.CN, firm + " (issued calculation sheets)").addRDN(BCStyle.O, firm).build();
            X509v3CertificateBuilder b = new JcaX509v3CertificateBuilder(name, new BigInteger(64, new SecureRandom()).abs(),
                    Date.from(now.minus(Duration.ofDays(1))), Date.from(now.plus(VALID_FOR)), name, pair.getPublic());
            b.addExtension(Extension.basicConstraints, true, new BasicConstraints(false));
            b.addExtension(Extension.keyUsage, true, new KeyUsage(KeyUsage.digitalSignature | KeyUsage.nonRepudiation));
            var signer = new JcaContentSignerBuilder("SHA256withRSA").build(pair.getPrivate());
            X509Certificate cert = new JcaX509CertificateConverter().getCertificate(b.build(signer));
            return new OfficeKey(pair.getPrivate(), cert);
        } catch (GeneralSecurityException | OperatorCreationException | IOException e) {
            throw new IllegalStateException("could not generate the office's signing key", e);
        }
    }

    /**
     * Writes the key as PKCS#12, the file created readable and writable by its owner only where the system allows;
     * false when a file appeared there meanwhile (it is left as it is).
     */
    boolean write(Path file, char[] password) {
        try {
            Path dir = file.toAbsolutePath().getParent();
            if (dir != null) Files.createDirectories(dir);
            KeyStore ks = KeyStore.getInstance("PKCS12");
            ks.load(null, null);
            ks.setKeyEntry("office", privateKey, password, new Certificate[] {certificate});
            Path tmp = Files.createTempFile(dir, ".signing-", ".p12");
            restrict(tmp);
            try (OutputStream out = Files.newOutputStream(tmp)) {
                ks.store(out, password);
            }
            try {
                Files.move(tmp, file);
                return true;
            } catch (java.nio.file.FileAlreadyExistsException e) {
                Files.deleteIfExists(tmp);
                return false;
            }
        } catch (IOException | GeneralSecurityException e) {
            throw new Unusable("signing key " + file + " cannot be written: " + e.getMessage());
        }
    }

    private static void restrict(Path f) throws IOException {
        if (!System.getProperty("os.name", "").toLowerCase(Locale.ROOT).contains("win"))
            Files.setPosixFilePermissions(f, java.nio.file.attribute.PosixFilePermissions.fromString("rw-------"));
    }

    /** The certificate's DER bytes, as the signature carries it. */
    byte[] encoded() {
        try {
            return certificate.getEncoded();
        } catch (CertificateEncodingException e) {
            throw new IllegalStateException(e);
        }
    }
}
