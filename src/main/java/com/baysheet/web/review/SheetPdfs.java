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
 * (marked as such, with the markups listed, not issued and dated when printed) and the issued copy (with the
 * checker's initials and date and the revision number). Nothing here computes; the title block comes from the
 * revision.
 */
final class SheetPdfs {
    private SheetPdfs() {}

    /** @param auditHead the audit trail's chain head at the issue, printed on the sheet */
    static RenderedPdf issued(Firm firm, SheetContext.OfMember s, SheetRevision approved, LocalDate today, String auditHead) {
        SheetHeader h = TitleBlocks.issuing(firm, s.computed().project().info(), s.member().name(), approved, today)
                .withAuditHead(auditHead);
        return SheetRenderer.issued(FramingSheets.member(h, s.computed().derived(), s.member().id()));
    }

    static RenderedPdf checking(Firm firm, SheetContext.OfMember s, SheetRevision r, List<MarkupNote> markups, LocalDate today) {
        SheetHeader h = TitleBlocks.underCheck(firm, s.computed().project().info(), s.member().name(), r, s.current(), today);
        MemberSheet sheet = FramingSheets.member(h, s.computed().derived(), s.member().id());
        return SheetRenderer.checking(sheet, markups.stream().map(SheetPdfs::markup).toList());
    }

    private static Markup markup(MarkupNote m) {
        return new Markup(m.target().sheetRef(), m.authorInitials(), m.text(), m.resolved(),
                m.replies().stream().map(x -> new Markup.Reply(x.authorInitials(), x.text())).toList());
    }
}
