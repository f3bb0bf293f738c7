package com.baysheet.engine.member;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.RecordNumbers;
import com.baysheet.engine.record.ResultKey;
import com.baysheet.engine.reduction.LiveFactors;

import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * A member's calculation: its record (what every page and sheet renders) and the unreduced end shares
 * that the framing model passes down the load path. For a column or a cantilever only {@code left} is set.
 *
 * <p>The numbers come first: {@link #value}, {@link #label} and {@link #stepValue} read the numbers-only pass's
 * results and steps ({@link RecordNumbers}: keys, labels and values, no shown text; the subject is not among them, so a
 * member under another subject shares them). The full record is written on the first call to {@link #record()}, by the same calculation
 * (deterministic, so identical), since most members of a large building are never displayed.
 */
public final class MemberResult {
    private final RecordNumbers numbers;
    private final EndShare left;
    private final EndShare right;
    private final LiveFactors reduction;
    private Supplier<CalcRecord> writer;
    private volatile CalcRecord record;
    private final Supplier<List<MethodComparison.Row>> comparer;
    private volatile List<MethodComparison.Row> methods;
    /** The calculation this one is under another subject (null: this is one), and that subject. */
    private final MemberResult base;
    private final String subject;

    MemberResult(RecordNumbers numbers, EndShare left, EndShare right, LiveFactors reduction, Supplier<CalcRecord> writer,
                 Supplier<List<MethodComparison.Row>> comparer) {
        this(numbers, left, right, reduction, writer, comparer, null, null);
    }

    private MemberResult(RecordNumbers numbers, EndShare left, EndShare right, LiveFactors reduction, Supplier<CalcRecord> writer,
                         Supplier<List<MethodComparison.Row>> comparer, MemberResult base, String subject) {
        this.base = base;
        this.subject = subject;
        this.comparer = comparer;
        this.numbers = numbers;
        this.left = left;
        this.right = right;
        this.reduction = reduction;
        this.writer = writer;
    }

    /** The full calculation record, written on first use. */
    public CalcRecord record() {
        CalcRecord r = record;
        if (r == null) {
            synchronized (this) {
                if (record == null) {
                    record = writer.get();
                    writer = null;
                }
                r = record;
            }
        }
        return r;
    }

    /**
     * The member's floor live load under each reduction method its project could choose, the project's own first
     * (worked out on first use); empty where it carries no floor live load.
     */
    public List<MethodComparison.Row> methods() {
        List<MethodComparison.Row> m = methods;
        if (m == null) methods = m = List.copyOf(comparer.get());
        return m;
    }

    public EndShare left() { return left; }

    public EndShare right() { return right; }

    /**
     * The floor live load reduction as the record states it (areas, influence area, factor), or empty where the
     * member carries no floor live load.
     */
    public Optional<LiveFactors> floorReduction() { return Optional.ofNullable(reduction); }

    /** A result by key without writing the record's text; NaN when absent. */
    public double value(String key) { return numbers.result(key); }

    public double value(ResultKey key) { return numbers.result(key.text()); }

    /** The label of a result (it names the governing combination), or "" when absent. */
    public String label(ResultKey key) { return label(key.text()); }

    public String label(String key) { return numbers.label(key); }

    /** A step's result by symbol, or NaN when the calculation had no such step. */
    public double stepValue(String symbol) { return numbers.step(symbol); }

    /** The same calculation under another subject. */
    public MemberResult withSubject(String subject) {
        MemberResult base = this.base != null ? this.base : this;
        return new MemberResult(numbers, left, right, reduction, () -> base.record().withSubject(subject), base::methods, base, subject);
    }

    /**
     * Whether {@code o} is this very calculation under the same subject (both made by {@link #withSubject} from one
     * calculation, or the same object): then their records and numbers are equal, whichever is read. A cheap test that
     * never compares records, so false says nothing about two calculations made apart.
     */
    public boolean sameAs(MemberResult o) {
        return this == o || base != null && base == o.base && subject.equals(o.subject);
    }
}
