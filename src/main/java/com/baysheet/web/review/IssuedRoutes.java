package com.baysheet.web.review;

import com.baysheet.auth.Tokens;
import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.issue.Issuing;
import com.baysheet.issue.SheetSubject;
import com.baysheet.review.RevisionComparison;
import com.baysheet.store.NotFound;
import com.baysheet.store.Store;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.store.review.StoredRevision;
import com.baysheet.web.auth.Admit;
import com.baysheet.web.auth.AuditRecorder;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;
import io.javalin.http.UploadedFile;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.ReviewRoutes.MARK;
import static com.baysheet.web.review.ReviewRoutes.SHEETS;

/**
 * PDFs (the frozen issued copy, a checking copy), revision comparison, and verifying an uploaded PDF.
 *
 * @param recorder where each download of an issued copy is recorded (null: nowhere)
 */
public record IssuedRoutes(Store store, ReviewStore review, Issuing issuing, AuditRecorder recorder) {
    /** A member sheet is tens of kilobytes; a package a few megabytes. Anything bigger is not one of ours. */
    private static final long MAX_UPLOAD = 50L * 1024 * 1024;

    public void install(RoutesConfig r) {
        r.get("/review/revisions/{revision}/issued.pdf", this::issuedPdf, Admit.OFFICE);
        r.get(MARK + "/checking.pdf", this::checkingPdf, Admit.OFFICE);
        for (String base : SHEETS) r.get(base + "/compare", this::compare, Admit.OFFICE);
        r.get("/verify", ctx -> ctx.render("review/verify", new HashMap<>(Map.of("fingerprint", issuing.signingKey().fingerprint()))),
                Admit.OFFICE);
        r.post("/verify", this::verify, Admit.OFFICE);
    }

    void issuedPdf(Context ctx) {
        long id = id(ctx.pathParam("revision"), "revision");
        StoredRevision r = review.reviews().revision(id);
        byte[] pdf = review.reviews().issuedPdf(id).orElseThrow(() -> new NotFound("issued copy of revision", id));
        IssuedMatch match = IssuedMatch.of(store, review.reviews(), r);
        if (recorder != null) recorder.downloaded(ctx, r.sheet().label(), "revision " + r.revision().number() + ", " + match.fileName());
        pdf(ctx, pdf, match.fileName());
    }

    void checkingPdf(Context ctx) {
        SheetSubject.OfMark s = SheetContext.mark(store, ctx);
        pdf(ctx, issuing.checkingCopy(s), s.computed().project().info().jobNumber() + "-" + s.name() + "-checking-copy.pdf");
    }

    void compare(Context ctx) {
        SheetSubject s = SheetContext.of(store, ctx);
        List<StoredRevision> h = review.reviews().view(s.ref()).history();
        int to = number(ctx, "to", h.isEmpty() ? 1 : h.get(h.size() - 1).revision().number());
        int from = number(ctx, "from", Math.max(1, to - 1));
        Map<String, Object> m = new HashMap<>();
        m.put("project", s.computed().project());
        m.put("name", s.name());
        m.put("back", s.path());
        m.put("history", h);
        m.put("from", from);
        m.put("to", to);
        m.put("comparison", RevisionComparison.of(record(h, from, s), record(h, to, s)));
        ctx.render("review/compare", m);
    }

    /**
     * The verdict on an upload: which issued revisions it is, byte for byte, whether each still stands (or was
     * superseded or withdrawn), whether its signature is intact and the office's, or that it is not a PDF at all.
     */
    void verify(Context ctx) {
        UploadedFile f = ctx.uploadedFile("pdf");
        if (f == null || f.size() == 0) throw new InputError("pdf", "nothing", "choose the PDF file to verify");
        if (f.size() > MAX_UPLOAD) throw new InputError("pdf", f.size() + " bytes", "is larger than any sheet or package");
        byte[] bytes = read(f);
        Map<String, Object> m = new HashMap<>();
        m.put("filename", f.filename());
        if (!isPdf(bytes)) {
            m.put("notPdf", true);
            ctx.status(HttpStatus.BAD_REQUEST);
            ctx.render("review/verify", m);
            return;
        }
        String sha = Tokens.sha256(bytes);
        List<IssuedMatch> matches = review.reviews().withPdf(sha).stream().map(r -> IssuedMatch.of(store, review.reviews(), r)).toList();
        m.put("sha256", sha);
        m.put("matches", matches);
        m.put("verdict", Verdict.of(matches, issuing.checkSignature(bytes)));
        m.put("fingerprint", issuing.signingKey().fingerprint());
        ctx.render("review/verify", m);
    }

    /** Every PDF begins with "%PDF-" (ISO 32000-1, 7.5.2 File header; clause number from memory). */
    static boolean isPdf(byte[] b) {
        byte[] magic = "%PDF-".getBytes(java.nio.charset.StandardCharsets.US_ASCII);
        return b.length >= magic.length && java.util.Arrays.equals(b, 0, magic.length, magic, 0, magic.length);
    }

    /** A revision's record as submitted; a revision not yet submitted compares as the member is now. */
    private static CalcRecord record(List<StoredRevision> h, int number, SheetSubject s) {
        for (StoredRevision r : h)
            if (r.revision().number() == number) return r.record().orElse(s.current());
        if (h.isEmpty() && number == 1) return s.current();
        throw new InputError("revision", number, "this sheet has no such revision");
    }

    private static int number(Context ctx, String param, int fallback) {
        String v = ctx.queryParam(param);
        if (v == null || v.isBlank()) return fallback;
        try {
            return Integer.parseInt(v.strip());
        } catch (NumberFormatException e) {
            throw new InputError(param, v, "must be a revision number");
        }
    }

    private static long id(String text, String what) {
        try {
            return Long.parseLong(text);
        } catch (NumberFormatException e) {
            throw new NotFound(what, text);
        }
    }

    private static byte[] read(UploadedFile f) {
        try (InputStream in = f.content()) {
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException("reading the upload", e);
        }
    }

    /** A PDF download with its SHA-256 in X-Content-SHA256, as docs/sheets.md promises. */
    private static void pdf(Context ctx, byte[] bytes, String filename) {
        ctx.contentType("application/pdf");
        ctx.header("X-Content-SHA256", Tokens.sha256(bytes));
        ctx.header("Content-Disposition", "attachment; filename=\"" + filename.replaceAll("[^A-Za-z0-9._-]", "_") + "\"");
        ctx.result(bytes);
    }
}
