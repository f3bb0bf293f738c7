package com.baysheet;

import com.baysheet.sheet.signing.OfficeKey;
import com.baysheet.sheet.signing.PdfSigner;

import java.time.Instant;

/** One signing key for every test of a JVM: an RSA 3072 key takes a second or more to generate. */
public final class TestKeys {
    private TestKeys() {}

    private static final class Holder {
        static final OfficeKey KEY = OfficeKey.generate("Test Office", Instant.now());
    }

    public static OfficeKey key() { return Holder.KEY; }

    public static PdfSigner signer() { return new PdfSigner(Holder.KEY); }
}
