package com.baysheet.web.review;

import com.baysheet.issue.SheetSubject;
import com.baysheet.notice.MailSettings;
import com.baysheet.notice.Notice;
import com.baysheet.notice.Notifier;
import com.baysheet.project.Project;
import com.baysheet.review.Caller;
import com.baysheet.review.SheetRevision;
import com.baysheet.store.review.MailStore;
import com.baysheet.store.review.ReviewStore;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Posts the e-mail notice of a review step once the step has committed: a sheet submitted (or resubmitted) to the
 * checkers other than its preparer, returned to its preparer, approved to the checkers who may issue it (not its
 * preparer, not the approver, who knows). A batch tells each person once for all its sheets. Nothing here can fail
 * the step: the addresses are read and the notice queued; sending is the {@link Notifier}'s, off the request.
 */
public final class ReviewNotices {
    private static final Logger LOG = LoggerFactory.getLogger(ReviewNotices.class);
    private final ReviewStore review;
    private final Notifier notifier;

    public ReviewNotices(ReviewStore review, Notifier notifier) {
        this.review = review;
        this.notifier = notifier;
    }

    /**
     * After these sheets of one project went through this step, done by {@code who}. The step has committed: should
     * the addresses not be read, that is logged and the step still answered as done.
     */
    public void after(Notice.Kind kind, Project project, List<? extends SheetSubject> sheets, Caller who) {
        if (sheets.isEmpty()) return;
        try {
            post(kind, project, sheets, who);
        } catch (RuntimeException e) {
            LOG.warn("no e-mail notice of \"{}\" for {} sheet(s): {}", kind.said(), sheets.size(), e.toString());
        }
    }

    private void post(Notice.Kind kind, Project project, List<? extends SheetSubject> sheets, Caller who) {
        MailStore mail = review.mail();
        MailSettings settings = mail.get().settings();
        if (!settings.on()) return;
        Map<String, List<String>> byAddress = new LinkedHashMap<>();
        Map<Long, String> addresses = mail.addresses();
        Map<Long, List<String>> checkers = new java.util.HashMap<>(); // by preparer: a batch is mostly one person's
        for (SheetSubject s : sheets) {
            Optional<SheetRevision.Preparer> preparer = Optional.ofNullable(review.reviews().view(s.ref()).current().revision().preparer());
            List<String> to = switch (kind) {
                case RETURNED -> preparer.map(p -> addresses.get(p.userId())).stream().filter(a -> a != null).toList();
                case SUBMITTED, APPROVED -> checkers.computeIfAbsent(preparer.map(SheetRevision.Preparer::userId).orElse(-1L),
                        mail::checkersOtherThan);
            };
            String mine = addresses.get(who.actor().userId());
            for (String a : to) if (!a.equals(mine)) byAddress.computeIfAbsent(a, k -> new ArrayList<>()).add(s.name());
        }
        String name = project.info().jobNumber() + " " + project.info().name();
        String link = settings.link("/review/projects/" + project.id() + "/queue");
        String by = who.username() + " (" + who.actor().initials() + ")";
        // one notice per distinct list of sheets, to everyone who is told of exactly those
        Map<List<String>, List<String>> byList = new LinkedHashMap<>();
        byAddress.forEach((a, list) -> byList.computeIfAbsent(list, k -> new ArrayList<>()).add(a));
        byList.forEach((list, to) -> notifier.post(new Notice(kind, name, list, by, link, to)));
    }
}
