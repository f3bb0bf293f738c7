package com.baysheet.web.review;

import com.baysheet.framing.MemberRole;
import com.baysheet.issue.Batch;
import com.baysheet.issue.SheetSubject;
import com.baysheet.notice.Notice;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.Actor;
import com.baysheet.review.CheckQueue;
import com.baysheet.review.SheetState;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.web.Confirmed;
import com.baysheet.web.Form;
import com.baysheet.web.auth.Access;
import com.baysheet.web.auth.Admit;
import com.baysheet.web.auth.AuditRecorder;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * The check queue of a project (what waits for the person looking, or every sheet, filtered) and the batch actions
 * on the sheets ticked there: submit, approve, and issue after a confirmation page. Each sheet of a batch goes
 * through the single action's own path ({@link Batch}); the post redirects to the queue, which shows the outcome.
 */
public final class QueueRoutes {
    static final String QUEUE = "/review/projects/{project}/queue";
    static final String BATCH = "/review/projects/{project}/batch";

    private final Store store;
    private final ReviewStore review;
    private final Batch batch;
    private final BatchResults results;
    private final AuditRecorder recorder;
    private final ReviewNotices notices;

    public QueueRoutes(Store store, ReviewStore review, Batch batch, AuditRecorder recorder, java.time.Clock clock, ReviewNotices notices) {
        this.notices = notices;
        this.store = store;
        this.review = review;
        this.batch = batch;
        this.results = new BatchResults(clock);
        this.recorder = recorder;
    }

    public void install(RoutesConfig r) {
        r.get("/review/queue", this::mine, Admit.OFFICE);
        r.get(QUEUE, this::show, Admit.OFFICE);
        r.post(BATCH + "/submit", ctx -> run(ctx, Batch.Kind.SUBMIT), Admit.PREPARER);
        r.post(BATCH + "/approve", ctx -> run(ctx, Batch.Kind.APPROVE), Admit.PREPARER);
        r.post(BATCH + "/issue/ask", this::askIssue, Admit.PREPARER);
        r.get(BATCH + "/issue", this::confirmIssue, Admit.OFFICE);
        r.post(BATCH + "/issue", this::issue, Admit.PREPARER);
    }

    /** The person's own queue across the office: for each project, how many sheets wait for them and why. */
    void mine(Context ctx) {
        Actor me = Actor.of(Access.user(ctx));
        Map<String, Object> m = new HashMap<>();
        m.put("rows", OfficeQueue.of(store, review, store.projects().findAll(), me).rows());
        m.put("reasons", CheckQueue.Waiting.values());
        ctx.render("review/my-queue", m);
    }

    void show(Context ctx) {
        long project = SheetContext.project(ctx);
        CheckQueue.Filter filter = QueueEntries.filter(ctx);
        Results.Computed c = store.results().of(project);
        List<CheckQueue.Entry> all = QueueEntries.of(review.reviews(), project, SheetContext.marks(store, c));
        Actor me = Actor.of(Access.user(ctx));
        Map<String, Object> m = new HashMap<>();
        m.put("project", c.project());
        m.put("filter", filter);
        m.put("entries", CheckQueue.select(all, filter, me));
        m.put("waiting", all.stream().collect(Collectors.toMap(CheckQueue.Entry::markId,
                e -> CheckQueue.waiting(e, me).map(CheckQueue.Waiting::label).orElse(""))));
        m.put("counts", CheckQueue.counts(all, filter, me));
        m.put("waitingCounts", CheckQueue.waitingCounts(all, me));
        m.put("levels", all.stream().map(CheckQueue.Entry::level).distinct().toList());
        m.put("roles", MemberRole.values());
        m.put("states", SheetState.values());
        m.put("preparers", all.stream().map(CheckQueue.Entry::preparerInitials).filter(s -> !s.isEmpty()).distinct().sorted().toList());
        m.put("me", me);
        m.put("batch", results.find(ctx.queryParam("batch"), me.userId()).orElse(null));
        m.put("batchAsked", ctx.queryParam("batch") != null);
        m.put("max", Batch.MAX_SHEETS);
        ctx.render("review/queue", m);
    }

    /** The ticked sheets, on to the page that confirms their issue (a page, so that nothing is issued by one click). */
    void askIssue(Context ctx) {
        long project = SheetContext.project(ctx);
        List<Batch.Pick> picks = QueueEntries.picks(Form.of(ctx).values("sheet"));
        String ids = picks.stream().map(p -> String.valueOf(p.markId())).collect(Collectors.joining(","));
        ctx.redirect("/review/projects/" + project + "/batch/issue?sheets=" + ids, HttpStatus.SEE_OTHER);
    }

    /** What a batch issue would issue: the ticked sheets ({@code sheets=}) or every approved sheet the filter admits. */
    void confirmIssue(Context ctx) {
        long project = SheetContext.project(ctx);
        List<Long> ids = QueueEntries.markIds(ctx.queryParam("sheets"));
        Results.Computed c = store.results().of(project);
        List<CheckQueue.Entry> all = QueueEntries.of(review.reviews(), project, SheetContext.marks(store, c));
        Actor me = Actor.of(Access.user(ctx));
        var wanted = new HashSet<>(ids);
        List<CheckQueue.Entry> chosen = ids.isEmpty()
                ? CheckQueue.select(all, new CheckQueue.Filter(ctx.queryParam("level"), ctx.queryParam("role"), SheetState.APPROVED,
                        ctx.queryParam("preparer"), false), me)
                : all.stream().filter(e -> wanted.contains(e.markId())).toList();
        if (chosen.size() > Batch.MAX_SHEETS) Batch.cap("sheets", chosen.size());
        Map<String, Object> m = new HashMap<>();
        m.put("project", c.project());
        m.put("entries", chosen);
        m.put("ready", chosen.stream().filter(e -> CheckQueue.waiting(e, me).orElse(null) == CheckQueue.Waiting.TO_ISSUE).count());
        m.put("waiting", chosen.stream().collect(Collectors.toMap(CheckQueue.Entry::markId,
                e -> CheckQueue.waiting(e, me).map(CheckQueue.Waiting::label).orElse(""))));
        ctx.render("review/batch-issue", m);
    }

    void issue(Context ctx) {
        Confirmed.require(Form.of(ctx), "an issue of several sheets");
        run(ctx, Batch.Kind.ISSUE);
    }

    private void run(Context ctx, Batch.Kind kind) {
        long project = SheetContext.project(ctx);
        List<Batch.Pick> picks = QueueEntries.picks(Form.of(ctx).values("sheet"));
        Results.Computed c = store.results().of(project);
        List<Batch.Outcome> outcomes = batch.run(kind, c, SheetContext.marks(store, c), picks, ReviewRoutes.caller(ctx),
                ctx.formParam("description"), kind == Batch.Kind.ISSUE ? store.projects().submittals().find(project) : null);
        // a refusal for the person's rights is recorded as the single action's is
        outcomes.forEach(o -> o.rulesRefusal().ifPresent(e -> recorder.refusedReview(ctx, e)));
        // each sheet's step has committed: one notice per person for the sheets done
        Notice.Kind told = kind == Batch.Kind.SUBMIT ? Notice.Kind.SUBMITTED : kind == Batch.Kind.APPROVE ? Notice.Kind.APPROVED : null;
        if (told != null) {
            MarkSheets marks = SheetContext.marks(store, c);
            notices.after(told, c.project(), outcomes.stream().filter(Batch.Outcome::done).map(o -> marks.byId(o.markId()).orElseThrow())
                    .map(m -> new SheetSubject.OfMark(c, marks, m, m.ref(project))).toList(), ReviewRoutes.caller(ctx));
        }
        String key = results.keep(Access.user(ctx).id(), kind, outcomes);
        ctx.redirect("/review/projects/" + project + "/queue?show=all&batch=" + key, HttpStatus.SEE_OTHER);
    }
}
