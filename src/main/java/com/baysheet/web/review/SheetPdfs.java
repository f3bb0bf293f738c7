package com.baysheet.web.review;

import com.baysheet.review.MarkupNote;
import com.baysheet.review.SheetRevision;
import com.baysheet.sheet.FramingSheets;
import com.baysheet.sheet.Markup;
import com.baysheet.sheet.MemberSheet;
import com.baysheet.sheet.RenderedPdf;
import com.baysheet.sheet.SheetHeader;
import com.baysheet.sheet.SheetRenderer;
import com.baysheet.store.review.Firm;

import java.time.LocalDate;
import java.util.List;

/**
 * Member sheets for the check, rendered by the sheet renderer from the current derivation: the checking copy
 * (marked as such, with the markups listed) and the issued copy (with the checker's initials and date and
 * the revision number). Nothing here computes; the title block comes from the revision.
 */
final class SheetPdfs {
    private SheetPdfs() {}

    static RenderedPdf issued(Firm firm, SheetContext.OfMember s, SheetRevision approved, LocalDate today) {
        SheetHeader h = header(firm, s, approved, approved.approval().initials(), approved.approval().on(), today);
        return SheetRenderer.issued(FramingSheets.member(h, s.computed().derived(), s.member().id()));
    }

    static RenderedPdf checking(Firm firm, SheetContext.OfMember s, SheetRevision r, List<MarkupNote> markups, String viewer,
                                LocalDate today) {
        String checker = r.approval() == null ? "" : r.approval().initials();
        LocalDate checkedOn = r.approval() == null ? null : r.approval().on();
        SheetHeader h = header(firm, s, r, checker, checkedOn, today);
        if (r.preparer() == null) h = new SheetHeader(h.firm(), h.project(), h.jobNumber(), h.subject(), viewer, today,
                h.checkedBy(), h.checkedOn(), h.revision(), today, h.logoText());
        MemberSheet sheet = FramingSheets.member(h, s.computed().derived(), s.member().id());
        return SheetRenderer.checking(sheet, markups.stream().map(SheetPdfs::markup).toList());
    }

    private static SheetHeader header(Firm firm, SheetContext.OfMember s, SheetRevision r, String checkedBy, LocalDate checkedOn,
                                      LocalDate today) {
        var info = s.computed().project().info();
        String preparedBy = r.preparer() == null ? "-" : r.preparer().initials();
        LocalDate preparedOn = r.preparer() == null ? today : r.preparer().on();
        return new SheetHeader(firm.name(), info.name(), info.jobNumber(), s.member().name(), preparedBy, preparedOn,
                checkedBy, checkedOn, String.valueOf(r.number()), today, firm.logoText());
    }

    private static Markup markup(MarkupNote m) {
        return new Markup(m.target().sheetRef(), m.authorInitials(), m.text(), m.resolved(),
                m.replies().stream().map(x -> new Markup.Reply(x.authorInitials(), x.text())).toList());
    }
}
