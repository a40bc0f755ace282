package org.strandbook.app.ui.workbook;

import java.util.Optional;

import org.strandbook.evaluation.Status;

/**
 * A point's measured status from the latest evaluation, for the points sheet.
 *
 * @param pointTag the point
 * @param status   PASS, REVIEW or FAIL; empty when the point could not be evaluated at all
 * @param finding  the finding in a few words, or why there is none
 */
public record PointStatus(String pointTag, Optional<Status> status, String finding) {
}
