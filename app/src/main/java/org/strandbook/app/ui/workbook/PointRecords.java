package org.strandbook.app.ui.workbook;

import java.util.List;

import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.ScanRecord;

/** What the window loads for one point: its segments and joints by leg, and its scans (without spectra). */
public record PointRecords(MeasurementPoint point, List<LegSegment> segments, List<LegJoint> joints,
                           List<ScanRecord> scans) {

    public PointRecords {
        segments = List.copyOf(segments);
        joints = List.copyOf(joints);
        scans = List.copyOf(scans);
    }
}
