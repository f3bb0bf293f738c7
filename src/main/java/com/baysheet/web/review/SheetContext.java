package com.baysheet.web.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.DerivedMember;
import com.baysheet.review.SheetRef;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import io.javalin.http.Context;

/** The member a sheet request names, as the current derivation gives it. */
record SheetContext(Results.Computed computed, DerivedMember member, SheetRef ref) {
    static SheetContext of(Store store, Context ctx) {
        long project = project(ctx);
        Results.Computed c = store.results().of(project);
        String id = ctx.pathParam("member");
        DerivedMember m = c.derived().member(id).orElseThrow(() -> new NotFound("member", id));
        return new SheetContext(c, m, new SheetRef(project, id));
    }

    static long project(Context ctx) {
        String text = ctx.pathParam("project");
        try {
            return Long.parseLong(text);
        } catch (NumberFormatException e) {
            throw new NotFound("project", text);
        }
    }

    CalcRecord current() { return member.result().record(); }

    /** The sheet page's path, for redirects after each action. */
    String path() {
        return "/review/projects/" + ref.projectId() + "/members/" + ref.subject();
    }
}
