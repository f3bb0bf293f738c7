package com.baysheet.framing;

import java.util.List;

/**
 * Where a part of the building is derived again (a level framed again, a column stack taken down again), each member
 * that comes out just as it was, every field equal and the very calculation under the same subject, is the earlier
 * derivation's member object: an edit of one bay then leaves every other member of its level the same object, and
 * what is kept by member ({@link Typicals}) is worked out again only for the members the edit changed.
 */
final class SameMembers {
    private final Derived before;

    /** @param before the building's earlier derivation (null: none, every member is new) */
    SameMembers(Derived before) {
        this.before = before;
    }

    /** Replaces, in {@code members} from {@code from} on, each member the earlier derivation had just so by its own. */
    void keep(List<DerivedMember> members, int from) {
        if (before == null) return;
        for (int k = from; k < members.size(); k++) {
            DerivedMember m = members.get(k);
            DerivedMember was = before.member(m.id()).orElse(null);
            if (was != null && was != m && same(was, m)) members.set(k, was);
        }
    }

    static boolean same(DerivedMember a, DerivedMember b) {
        return a.result().sameAs(b.result()) && a.id().equals(b.id()) && a.name().equals(b.name()) && a.level().equals(b.level())
                && a.role() == b.role() && a.kind() == b.kind() && a.plan().equals(b.plan()) && Double.compare(a.span(), b.span()) == 0
                && Double.compare(a.tributaryWidth(), b.tributaryWidth()) == 0 && Double.compare(a.directArea(), b.directArea()) == 0 && a.areas().equals(b.areas())
                && a.bays().equals(b.bays()) && a.tributary().equals(b.tributary());
    }
}
