package com.baysheet.issue;

import com.baysheet.review.MarkupNote;
import com.baysheet.review.SheetRevision;
import com.baysheet.sheet.Revision;
import com.baysheet.store.review.StoredRevision;
import com.baysheet.sheet.FramingSheets;
import com.baysheet.sheet.Markup;
import com.baysheet.sheet.MemberSheet;
import com.baysheet.sheet.RenderedPdf;
import com.baysheet.sheet.SheetHeader;
import com.baysheet.sheet.SheetRenderer;
import com.baysheet.project.Firm;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/**
 * Mark sheets (one per typical member) for the check, rendered by the sheet renderer from the current derivation: the checking copy
 * (marked as such, with the markups listed, not issued and dated when printed) and the issued copy (with the
 * checker's initials and date and the revision number). Nothing here computes; the title block comes from the
 * revision.
 */
final class SheetPdfs {
    private SheetPdfs() {}

    /** The issued copy of the approved revision: its revision block lists the earlier issues and this one, described as given. */
    /** @param auditHead the audit trail's chain head at the issue, printed on the sheet */
    static RenderedPdf issued(Firm firm, SheetSubject.OfMark s, StoredRevision approved, List<StoredRevision> history,
                              LocalDate today, String description, String auditHead) {
        SheetHeader h = TitleBlocks.issuing(firm, s.computed().project().info(), s.name(), approved, today).withAuditHead(auditHead);
        List<Revision> block = new ArrayList<>(issues(history));
        SheetRevision r = approved.revision();
        block.add(new Revision(approved.label(), today, description, r.preparer().initials() + " / " + r.approval().initials()));
        return SheetRenderer.issued(FramingSheets.typical(h, s.computed().derived(), s.sheet().group(), s.name()).withRevisions(block));
    }

    /** The revision block of a sheet's earlier issues (a revision issued before descriptions were asked says "Issued"). */
    static List<Revision> issues(List<StoredRevision> history) {
        List<Revision> out = new ArrayList<>();
        for (StoredRevision x : history) {
            SheetRevision r = x.revision();
            if (r.issue() == null) continue;
            String said = r.issue().description() == null ? "Issued" : r.issue().description();
            out.add(new Revision(x.label(), r.issue().on(), said, r.preparer().initials() + " / " + r.approval().initials()));
        }
        return out;
    }

    static RenderedPdf checking(Firm firm, SheetSubject.OfMark s, StoredRevision r, List<StoredRevision> history,
                                List<MarkupNote> markups, LocalDate today) {
        SheetHeader h = TitleBlocks.underCheck(firm, s.computed().project().info(), s.name(), r, s.current(), today);
        MemberSheet sheet = FramingSheets.typical(h, s.computed().derived(), s.sheet().group(), s.name()).withRevisions(issues(history));
        return SheetRenderer.checking(sheet, markups.stream().map(SheetPdfs::markup).toList());
    }

    private static Markup markup(MarkupNote m) {
        return new Markup(m.target().sheetRef(), m.authorInitials(), m.text(), m.resolved(),
                m.replies().stream().map(x -> new Markup.Reply(x.authorInitials(), x.text())).toList());
    }
}
