package com.baysheet.engine.member;

import com.baysheet.engine.record.CalcRecord;

/**
 * A member's calculation: its record (what every page and sheet renders) and the unreduced end shares
 * that the framing model passes down the load path. For a column or a cantilever only {@code left} is set.
 */
public record MemberResult(CalcRecord record, EndShare left, EndShare right) {}
