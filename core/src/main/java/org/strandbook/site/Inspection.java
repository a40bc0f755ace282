package org.strandbook.site;

import java.time.Instant;

/**
 * An end-face inspection of one joint of a point, a dated event: the joint's grade at any moment
 * is its latest inspection up to then ({@link InspectionHistory}).
 *
 * @param pictureFile the file name of the end-face picture, if one was kept; may be empty
 */
public record Inspection(String pointTag, String jointLabel, Instant inspectedAt, String inspector,
                         InspectionGrade grade, String remark, String pictureFile) {

    public Inspection {
        pointTag = Require.text(pointTag, "point tag");
        jointLabel = Require.text(jointLabel, "joint label");
        inspector = inspector == null ? "" : inspector.strip();
        grade = grade == null ? InspectionGrade.NOT_INSPECTED : grade;
        remark = remark == null ? "" : remark;
        pictureFile = pictureFile == null ? "" : pictureFile.strip();
    }

    /** An inspection without a picture. */
    public Inspection(String pointTag, String jointLabel, Instant inspectedAt, String inspector,
                      InspectionGrade grade, String remark) {
        this(pointTag, jointLabel, inspectedAt, inspector, grade, remark, "");
    }
}
