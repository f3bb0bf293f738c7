package com.baysheet.web;

import com.baysheet.framing.DerivedMember;
import io.javalin.http.Context;

import java.util.List;

/** The member list's filters from the query: level name, role and Table 4.7-1 kind; blank means any. */
record MemberFilter(String level, String role, String kind) {
    static MemberFilter of(Context ctx) {
        return new MemberFilter(blank(ctx.queryParam("level")), blank(ctx.queryParam("role")), blank(ctx.queryParam("kind")));
    }

    List<DerivedMember> apply(List<DerivedMember> members) {
        return members.stream()
                .filter(m -> level.isEmpty() || m.level().equals(level))
                .filter(m -> role.isEmpty() || m.role().name().equalsIgnoreCase(role))
                .filter(m -> kind.isEmpty() || m.kind().name().equalsIgnoreCase(kind))
                .toList();
    }

    private static String blank(String s) { return s == null ? "" : s.strip(); }
}
