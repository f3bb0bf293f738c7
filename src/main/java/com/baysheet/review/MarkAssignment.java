package com.baysheet.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.TypicalGroup;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;

/**
 * Which mark each typical group of a derivation carries, given the marks stored so far and the mark each
 * member carried before. Marks never renumber:
 * <ol>
 * <li>a group keeps the mark its members carried whose calculation is still theirs (an edit of one bay leaves
 * the rest of its group with their mark; an edit undone brings the split-off members back to it);</li>
 * <li>otherwise, largest group first, a group keeps the mark most of its members carried, if no other group
 * has taken it (a change to every member of a group keeps its mark, and its sheet is "changed since issue");</li>
 * <li>otherwise a group whose calculation is that of a mark no group has taken gets that mark (a group that
 * reappears, such as an edit undone, gets its old mark back);</li>
 * <li>what is left is a new mark, the next free number of its prefix, naming the mark most of its members came
 * from (a group split off by an edit).</li>
 * </ol>
 * A stored mark no group carries is kept, inactive, so that its number is never given again.
 */
public final class MarkAssignment {
    /** One group and its mark ({@code mark.id()} 0 for a new one). */
    public record Assigned(TypicalGroup group, Mark mark) {}

    /** The groups with their marks (in the groups' order), and every stored mark as it now stands. */
    public record Result(List<Assigned> assigned, List<Mark> retired) {}

    private MarkAssignment() {}

    /** @param carried each member id and the id of the mark it carried before */
    public static Result of(List<TypicalGroup> groups, List<Mark> stored, Map<String, Long> carried) {
        return of(groups, stored, carried, CalcFingerprint::of);
    }

    /** As {@link #of(List, List, Map)}, each group's calculation fingerprinted by {@code fingerprint} (as {@link CalcFingerprint#of} does). */
    public static Result of(List<TypicalGroup> groups, List<Mark> stored, Map<String, Long> carried, Function<CalcRecord, String> fingerprint) {
        return of(groups, stored, carried::get, fingerprint, Map.of());
    }

    /**
     * As {@link #of(List, List, Map, Function)}, {@code carried} looked up by member id, where each group of {@code unchanged} (by identity) is known to be a group
     * the last assignment gave its mark, every member carrying it, with the same members and calculation: rule 1 gives
     * it that mark again (no other group's members carried it), so it is given without counting its members, and only
     * the other groups are worked out. An edit of one bay leaves most groups of a building unchanged.
     */
    public static Result of(List<TypicalGroup> groups, List<Mark> stored, Function<String, Long> carried, Function<CalcRecord, String> fingerprint,
                            Map<TypicalGroup, Mark> unchanged) {
        // keyed by the group itself: a group's own hash would hash every member it holds, and no two groups are equal
        Map<TypicalGroup, Mark> chosen = new IdentityHashMap<>();
        Map<TypicalGroup, String> calc = new IdentityHashMap<>();
        Set<Long> taken = new HashSet<>();
        // the groups left to work out, in the groups' order: each rule below reads only them
        List<TypicalGroup> open = new ArrayList<>();
        for (TypicalGroup g : groups) {
            Mark m = unchanged.isEmpty() ? null : unchanged.get(g);
            if (m == null) {
                calc.put(g, fingerprint.apply(g.calculation()));
                open.add(g);
            } else {
                chosen.put(g, m.given(m.calc(), true));
                taken.add(m.id());
            }
        }
        Map<Long, Mark> byId = new HashMap<>();
        for (Mark m : stored) byId.put(m.id(), m);
        for (TypicalGroup g : open) {
            Mark m = byId.get(mostCarried(g, carried, byId, x -> x.calc().equals(calc.get(g))));
            if (m != null && !taken.contains(m.id()) && m.prefix().equals(Mark.prefix(g.role()))) {
                chosen.put(g, m.given(calc.get(g), true));
                taken.add(m.id());
            }
        }
        // largest first, a tie in the groups' order (a stable sort)
        List<TypicalGroup> bySize = new ArrayList<>();
        for (TypicalGroup g : open) if (!chosen.containsKey(g)) bySize.add(g);
        bySize.sort(Comparator.comparingInt((TypicalGroup g) -> -g.members().size()));
        for (TypicalGroup g : bySize) {
            Mark m = byId.get(mostCarried(g, carried, byId));
            if (m != null && !taken.contains(m.id()) && m.prefix().equals(Mark.prefix(g.role()))) {
                chosen.put(g, m.given(calc.get(g), true));
                taken.add(m.id());
            }
        }
        // the stored marks by calculation, and the numbers and texts given, made only if some group is still without a mark
        Map<String, List<Mark>> byCalc = null;
        Set<String> texts = null;
        Map<String, Integer> last = null;
        for (TypicalGroup g : open) {
            if (chosen.containsKey(g)) continue;
            if (byCalc == null) {
                byCalc = new HashMap<>();
                texts = new HashSet<>();
                last = new HashMap<>();
                for (Mark m : stored) {
                    byCalc.computeIfAbsent(m.calc(), k -> new ArrayList<>()).add(m);
                    texts.add(m.text());
                    last.merge(m.prefix(), m.seq(), Math::max);
                }
            }
            byCalc.getOrDefault(calc.get(g), List.of()).stream()
                    .filter(m -> m.prefix().equals(Mark.prefix(g.role())) && !taken.contains(m.id()))
                    .min(Comparator.comparing((Mark m) -> !m.active()).thenComparingInt(Mark::seq))
                    .ifPresent(m -> { chosen.put(g, m.given(calc.get(g), true)); taken.add(m.id()); });
        }
        List<Assigned> out = new ArrayList<>(groups.size());
        for (TypicalGroup g : groups) {
            Mark m = chosen.get(g);
            if (m == null) {
                String prefix = Mark.prefix(g.role());
                int seq = last.getOrDefault(prefix, 0) + 1;
                // a renamed mark may hold the text a number would print: that number is passed over (bounded by the marks stored)
                while (texts.contains(prefix + seq)) seq++;
                last.put(prefix, seq);
                texts.add(prefix + seq);
                m = new Mark(0, prefix, seq, prefix + seq, calc.get(g), mostCarried(g, carried, byId), true);
            }
            out.add(new Assigned(g, m));
        }
        List<Mark> retired = stored.stream().filter(m -> !taken.contains(m.id())).map(m -> m.given(m.calc(), false)).toList();
        return new Result(out, retired);
    }

    /** The stored mark most of the group's members carried (the first in reading order on a tie), or null. */
    private static Long mostCarried(TypicalGroup g, Function<String, Long> carried, Map<Long, Mark> stored) {
        return mostCarried(g, carried, stored, m -> true);
    }

    /** As {@link #mostCarried(TypicalGroup, Function, Map)}, among the marks that pass {@code which}. */
    private static Long mostCarried(TypicalGroup g, Function<String, Long> carried, Map<Long, Mark> stored, java.util.function.Predicate<Mark> which) {
        Map<Long, Integer> count = new HashMap<>();
        Long best = null;
        for (var x : g.members()) {
            Long m = carried.apply(x.id());
            if (m == null || !stored.containsKey(m) || !which.test(stored.get(m))) continue;
            int n = count.merge(m, 1, Integer::sum);
            if (best == null || n > count.get(best)) best = m;
        }
        return best;
    }
}
