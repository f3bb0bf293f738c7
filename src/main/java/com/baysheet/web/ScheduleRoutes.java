package com.baysheet.web;

import com.baysheet.web.auth.Admit;
import com.baysheet.engine.units.Display;
import com.baysheet.framing.Derived;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.schedule.ColumnSchedules;
import com.baysheet.framing.schedule.MarkSchedule;
import com.baysheet.framing.schedule.LoadSchedule;
import com.baysheet.framing.schedule.MemberSchedule;
import com.baysheet.sheet.ScheduleCsv;
import com.baysheet.sheet.ScheduleXlsx;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BiFunction;

/**
 * The load summaries of a project (column loads, foundation reactions, members by mark and by level), each member
 * labelled by its mark: one page showing them, each
 * as a CSV and an XLSX download, and each in the JSON API. All read from the current derivation's take-downs
 * and records.
 */
record ScheduleRoutes(Store store) {
    /** The schedules by the key their paths and file names use, in the order the page shows them. */
    static final Map<String, BiFunction<Derived, MemberLabels, LoadSchedule>> SCHEDULES = new LinkedHashMap<>();

    static {
        SCHEDULES.put("column-loads", (d, marks) -> ColumnSchedules.loads(d, t -> true, marks));
        SCHEDULES.put("foundation-reactions", (d, marks) -> ColumnSchedules.foundations(d, t -> true, marks));
        SCHEDULES.put("marks", MarkSchedule::of);
        SCHEDULES.put("members", MemberSchedule::of);
    }

    void install(RoutesConfig r) {
        r.get("/projects/{project}/schedules", this::show, Admit.OFFICE);
        for (var e : SCHEDULES.entrySet()) {
            String key = e.getKey();
            r.get("/projects/{project}/schedules/" + key + ".csv", ctx -> csv(ctx, key), Admit.OFFICE);
            r.get("/projects/{project}/schedules/" + key + ".xlsx", ctx -> xlsx(ctx, key), Admit.OFFICE);
            r.get("/api/projects/{project}/schedules/" + key, ctx -> Json.send(ctx, ScheduleJson.of(schedule(ctx, key))), Admit.OFFICE);
        }
        r.get("/api/projects/{project}/schedules", ctx -> {
            Results.Computed c = results(ctx);
            MemberLabels marks = marks(c);
            Json.send(ctx, SCHEDULES.values().stream().map(f -> ScheduleJson.of(f.apply(c.derived(), marks))).toList());
        }, Admit.OFFICE);
    }

    void show(Context ctx) {
        Results.Computed c = results(ctx);
        Map<String, Object> m = MemberRoutes.base(c);
        List<Shown> shown = new ArrayList<>();
        MemberLabels marks = marks(c);
        for (var e : SCHEDULES.entrySet()) shown.add(Shown.of(e.getKey(), e.getValue().apply(c.derived(), marks)));
        m.put("schedules", shown);
        ctx.render("schedules/show", m);
    }

    private void csv(Context ctx, String key) {
        download(ctx, key, "csv", "text/csv; charset=utf-8", ScheduleCsv.of(schedule(ctx, key)).getBytes(StandardCharsets.UTF_8));
    }

    private void xlsx(Context ctx, String key) {
        Results.Computed c = results(ctx);
        var info = c.project().info();
        byte[] book = ScheduleXlsx.of(schedule(c, key), info.name() + ", job " + info.jobNumber());
        download(ctx, key, "xlsx", "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", book);
    }

    private void download(Context ctx, String key, String ext, String type, byte[] body) {
        String job = results(ctx).project().info().jobNumber().replaceAll("[^A-Za-z0-9._-]", "_");
        ctx.header("Content-Disposition", "attachment; filename=\"" + job + "-" + key + "." + ext + "\"");
        ctx.contentType(type).result(body);
    }

    private LoadSchedule schedule(Context ctx, String key) { return schedule(results(ctx), key); }

    private LoadSchedule schedule(Results.Computed c, String key) { return SCHEDULES.get(key).apply(c.derived(), marks(c)); }

    /** Each member by the mark its sheet is under, as the package and the plans print it. */
    private MemberLabels marks(Results.Computed c) { return store.marks().of(c.project().id(), c.derived()).labels(); }

    private Results.Computed results(Context ctx) { return store.results().of(Ids.project(ctx)); }

    /** A schedule as the page prints it: headings with units, values to three significant figures. */
    record Shown(String key, String title, List<String> headings, List<Boolean> numbers, List<List<String>> rows, List<String> notes) {
        static Shown of(String key, LoadSchedule s) {
            List<String> heads = new ArrayList<>();
            List<Boolean> numbers = new ArrayList<>();
            for (int c = 0; c < s.columns().size(); c++) { heads.add(s.heading(c)); numbers.add(s.columns().get(c).isNumber()); }
            List<List<String>> rows = new ArrayList<>();
            for (int r = 0; r < s.rows().size(); r++) {
                List<String> row = new ArrayList<>();
                for (int c = 0; c < s.columns().size(); c++)
                    row.add(!numbers.get(c) ? (String) s.rows().get(r).get(c) : Double.isNaN(s.shown(r, c)) ? "—" : Display.sig3(s.shown(r, c)));
                rows.add(row);
            }
            return new Shown(key, s.title(), heads, numbers, rows, s.notes());
        }
    }

    /**
     * A schedule in the API: numbers in the base unit each column names (as everywhere in the API), null where a
     * value does not apply; text columns have no unit.
     */
    record ScheduleJson(String key, String title, String units, List<ColumnJson> columns, List<List<Object>> rows, List<String> notes) {
        record ColumnJson(String heading, String unit, String shownUnit) {}

        static ScheduleJson of(LoadSchedule s) {
            List<ColumnJson> cols = s.columns().stream().map(c -> new ColumnJson(c.heading(),
                    c.isNumber() ? c.quantity().base(s.system()).symbol() : null,
                    c.isNumber() ? c.quantity().unit(s.system()).symbol() : null)).toList();
            List<List<Object>> rows = new ArrayList<>();
            for (List<Object> row : s.rows()) {
                List<Object> out = new ArrayList<>();
                for (Object cell : row) out.add(cell instanceof Double v && Double.isNaN(v) ? null : cell);
                rows.add(out);
            }
            return new ScheduleJson(s.key(), s.title(), s.system().name(), cols, rows, s.notes());
        }
    }
}
