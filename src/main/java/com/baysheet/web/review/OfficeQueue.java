package com.baysheet.web.review;

import com.baysheet.project.Project;
import com.baysheet.review.Actor;
import com.baysheet.review.CheckQueue;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import com.baysheet.store.review.ReviewStore;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * What waits for one person in each of the office's projects, and in all: the rows of their own check queue and
 * the counts on the home page. Each project's count is its check queue's ({@link CheckQueue#waitingCounts}).
 */
public final class OfficeQueue {
    /** One project's line: how many of its sheets wait for the person, for each reason, and in all. */
    public record ProjectWaiting(Project project, Map<CheckQueue.Waiting, Integer> counts, int total) {}

    /** The projects' lines, in the order given, and the sums over them. */
    public record Summary(List<ProjectWaiting> rows, Map<CheckQueue.Waiting, Integer> totals) {
        public int total() { return totals.values().stream().mapToInt(Integer::intValue).sum(); }

        /** The line of this project. */
        public ProjectWaiting of(Project p) {
            return rows.stream().filter(r -> r.project().id() == p.id()).findFirst().orElseThrow();
        }
    }

    private OfficeQueue() {}

    public static Summary of(Store store, ReviewStore review, List<Project> projects, Actor me) {
        List<ProjectWaiting> rows = new ArrayList<>(projects.size());
        Map<CheckQueue.Waiting, Integer> totals = new EnumMap<>(CheckQueue.Waiting.class);
        for (CheckQueue.Waiting w : CheckQueue.Waiting.values()) totals.put(w, 0);
        for (Project p : projects) {
            Results.Computed c = store.results().of(p.id());
            var counts = CheckQueue.waitingCounts(QueueEntries.of(review.reviews(), p.id(), SheetContext.marks(store, c)), me);
            counts.forEach((w, n) -> totals.merge(w, n, Integer::sum));
            rows.add(new ProjectWaiting(p, counts, counts.values().stream().mapToInt(Integer::intValue).sum()));
        }
        return new Summary(rows, totals);
    }
}
