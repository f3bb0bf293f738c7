package com.baysheet.issue;

import com.baysheet.framing.model.Submittal;
import com.baysheet.review.Caller;
import com.baysheet.review.ReviewAction;
import com.baysheet.review.ReviewRefused;
import com.baysheet.review.SheetRevision;
import com.baysheet.review.SheetState;
import com.baysheet.sheet.signing.OfficeKey;
import com.baysheet.sheet.signing.PdfSigner;
import com.baysheet.sheet.signing.SignatureCheck;
import com.baysheet.store.review.ConcurrentChange;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.store.review.Reviews;
import com.baysheet.store.review.StoredRevision;

import java.time.Clock;
import java.time.LocalDate;

/**
 * Issuing and printing sheets: render the issued copy of an approved revision and issue it (the review rules
 * check everything again in the same write) and print a member's checking copy (a package's checking copy is
 * rendered off the request threads: {@link PackageJobs}). Dates come from the clock the office runs on.
 */
public final class Issuing {
    private final ReviewStore review;
    private final Clock clock;
    private final PdfSigner signer;

    /** @param signer the office's key, which signs every issued copy before it is stored */
    public Issuing(ReviewStore review, Clock clock, PdfSigner signer) {
        this.review = review;
        this.clock = clock;
        this.signer = signer;
    }

    /**
     * Renders the approved revision's issued copy and issues it, at the version the page showed, with the
     * revision's description as the revision block prints it.
     */
    public void issue(SheetSubject s, long version, Caller caller, String description, Submittal site) {
        Reviews.SheetView v = reviews().view(s.ref());
        StoredRevision cur = v.current();
        // checked before rendering the PDF; the review rules check everything again when issuing
        if (cur.version() != version) throw new ConcurrentChange("The sheet " + s.name());
        if (cur.revision().state() != SheetState.APPROVED)
            throw new ReviewRefused.WrongState(ReviewAction.ISSUE, cur.revision().state(), "only an approved sheet is issued");
        cur.revision().mayIssue(caller.actor());
        String said = SheetRevision.description(description);
        LocalDate today = today();
        String head = review.audit().head().printed(); // the trail as it stands at the issue, printed on the copy
        byte[] rendered = s instanceof SheetSubject.OfMark m ? SheetPdfs.issued(review.firm().get(), m, cur, v.history(), today, said, head).bytes()
                : PackagePdfs.issued(review.firm().get(), site, (SheetSubject.OfPackage) s, v, reviews().latestOf(s.ref().projectId()), today, said, head);
        // signed before it is stored: the SHA-256 the store keeps, and /verify compares, is of the signed file
        byte[] pdf = signer.sign(rendered, clock.instant(), "Issued: " + s.name() + ", revision " + cur.label());
        reviews().issue(s.ref(), version, caller, today, s.current(), pdf, said);
    }

    /** A mark sheet's checking copy as it is now: the revision under way, its earlier issues and markups, dated today. */
    public byte[] checkingCopy(SheetSubject.OfMark s) {
        Reviews.SheetView v = reviews().view(s.ref());
        return SheetPdfs.checking(review.firm().get(), s, v.current(), v.history(), v.markups(), today()).bytes();
    }

    /** The key that signs issued copies. */
    public OfficeKey signingKey() { return signer.key(); }

    /** Whether a PDF's signature is intact over the whole file, and whether it is this office's key that made it. */
    public SignatureCheck checkSignature(byte[] pdf) { return SignatureCheck.of(pdf, signer.key().certificate()); }

    public LocalDate today() { return LocalDate.now(clock); }

    private Reviews reviews() { return review.reviews(); }
}
