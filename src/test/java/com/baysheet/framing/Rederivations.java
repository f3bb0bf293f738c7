package com.baysheet.framing;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.model.Building;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Compares two derivations of one building member by member and take-down by take-down, every number and every record's text. */
final class Rederivations {
    private Rederivations() {}

    /** What a derivation gives: its result, or the refusal's message. */
    record Outcome(Derived derived, String refused) {
        static Outcome of(java.util.function.Supplier<Derived> d) {
            try {
                return new Outcome(d.get(), null);
            } catch (InputError e) {
                return new Outcome(null, e.getMessage());
            }
        }
    }

    static void assertSame(Outcome incremental, Outcome full, String as) {
        assertThat(incremental.refused()).as(as).isEqualTo(full.refused());
        if (full.derived() != null) assertSame(incremental.derived(), full.derived(), as);
    }

    static void assertSame(Derived incremental, Derived full, String as) {
        assertThat(incremental.building()).as(as).isEqualTo(full.building());
        // a level's members as the plans read them, gathered from the parts (those kept from the derivation before too)
        for (var l : full.building().levels())
            assertThat(incremental.onLevel(l.name())).as("%s: members on %s", as, l.name())
                    .containsExactlyElementsOf(incremental.members().stream().filter(m -> m.level().equals(l.name())).toList());
        assertThat(incremental.members()).as(as).hasSameSizeAs(full.members());
        for (int k = 0; k < full.members().size(); k++) {
            DerivedMember a = incremental.members().get(k), b = full.members().get(k);
            assertThat(fields(a)).as("%s: member %s", as, b.id()).isEqualTo(fields(b));
            assertThat(RecordJson.write(a.result().record())).as("%s: record of %s", as, b.id()).isEqualTo(RecordJson.write(b.result().record()));
        }
        assertThat(incremental.takeDowns()).as(as).hasSameSizeAs(full.takeDowns());
        for (int k = 0; k < full.takeDowns().size(); k++) {
            TakeDown a = incremental.takeDowns().get(k), b = full.takeDowns().get(k);
            assertThat(a.id()).as(as).isEqualTo(b.id());
            assertThat(a.gridPoint()).as(as).isEqualTo(b.gridPoint());
            assertThat(a.rows()).as("%s: take-down %s", as, b.id()).isEqualTo(b.rows());
            assertThat(RecordJson.write(a.record())).as("%s: take-down record %s", as, b.id()).isEqualTo(RecordJson.write(b.record()));
        }
    }

    /** Everything of a member but its result's record, which is compared as text. */
    private static List<Object> fields(DerivedMember m) {
        List<Object> out = new ArrayList<>(List.of(m.id(), m.name(), m.level(), m.role(), m.kind(), m.plan(), m.span(),
                m.tributaryWidth(), m.areas(), m.directArea(), m.bays(), m.tributary()));
        out.add(m.result().left());
        out.add(m.result().right());
        out.add(m.result().floorReduction());
        return out;
    }

    /** The levels of {@code later} whose members are the very objects {@code earlier} holds (reused, not framed again). */
    static List<String> reusedLevels(Derived earlier, Derived later) {
        // a level reused is its framing's very part (a level framed again may keep unchanged members, never its part)
        java.util.Set<List<DerivedMember>> before = java.util.Collections.newSetFromMap(new java.util.IdentityHashMap<>());
        before.addAll(earlier.parts());
        List<String> out = new ArrayList<>();
        for (List<DerivedMember> p : later.parts())
            if (p.get(0).role() != MemberRole.COLUMN && before.contains(p) && !out.contains(p.get(0).level())) out.add(p.get(0).level());
        return out;
    }

    static Derived full(Building b) { return Derivation.derive(b); }
}
