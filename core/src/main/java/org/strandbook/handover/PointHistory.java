package org.strandbook.handover;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.strandbook.site.Inspection;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.Note;
import org.strandbook.site.ScanRecord;
import org.strandbook.store.SignatureState;
import org.strandbook.store.Workbook;

/** A point's records in time order, as the history panel and {@code strandbook history} show them. */
public final class PointHistory {

    private PointHistory() {
    }

    /**
     * @throws org.strandbook.store.UnknownEntryException for an unknown point tag
     */
    public static List<PointEvent> read(Workbook wb, String pointTag) {
        List<PointEvent> out = new ArrayList<>();
        for (ScanRecord s : wb.scans().list(pointTag)) {
            out.add(new PointEvent(s.takenAt(), PointEvent.Kind.SCAN, s.kind().name().toLowerCase(Locale.ROOT),
                    s.conditions().operator(), s.sourceFile()));
        }
        for (Inspection i : wb.inspections().list(pointTag)) {
            out.add(new PointEvent(i.inspectedAt(), PointEvent.Kind.INSPECTION, i.jointLabel(), i.inspector(),
                    "graded " + i.grade().name().toLowerCase(Locale.ROOT)
                            + (i.remark().isEmpty() ? "" : ": " + i.remark())
                            + (i.pictureFile().isEmpty() ? "" : " [picture " + i.pictureFile() + "]")));
        }
        for (MaintenanceAction a : wb.maintenance().list(pointTag)) {
            out.add(new PointEvent(a.performedAt(), PointEvent.Kind.ACTION, a.elementLabel(), a.performedBy(),
                    a.kind().words() + (a.what().isEmpty() ? "" : ": " + a.what())
                            + (a.why().isEmpty() ? "" : "; why: " + a.why())));
        }
        for (Note n : wb.notes().list(pointTag)) {
            out.add(new PointEvent(n.writtenAt(), PointEvent.Kind.NOTE, n.elementLabel(), n.author(), n.text()));
        }
        for (SignatureState s : wb.signOffs().states()) {
            if (s.signOff().pointTag().equalsIgnoreCase(pointTag)) {
                out.add(new PointEvent(s.signOff().signedAt(), PointEvent.Kind.SIGN_OFF, "", s.signOff().name(),
                        SignatureText.line(s)));
            }
        }
        out.sort(Comparator.comparing(PointEvent::at));
        return out;
    }
}
