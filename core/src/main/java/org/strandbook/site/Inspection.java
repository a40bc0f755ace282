package org.strandbook.site;

import java.time.Instant;

/** An end-face inspection of one joint of a point. */
public record Inspection(String pointTag, String jointLabel, Instant inspectedAt, String inspector,
                         InspectionGrade grade, String remark) {

    public Inspection {
        pointTag = Require.text(pointTag, "point tag");
        jointLabel = Require.text(jointLabel, "joint label");
        inspector = inspector == null ? "" : inspector.strip();
        grade = grade == null ? InspectionGrade.NOT_INSPECTED : grade;
        remark = remark == null ? "" : remark;
    }
}
