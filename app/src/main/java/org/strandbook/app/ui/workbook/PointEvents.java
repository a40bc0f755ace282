package org.strandbook.app.ui.workbook;

/** What the point's view model tells the workbook's view model. */
interface PointEvents {

    /** The point's legs changed in memory (the save follows in the background). */
    void legsChanged(String pointTag);

    /** The point was evaluated from the workbook. */
    void evaluated(PointStatus status);

    /**
     * The latest scans' integration times and how their counts were put on one scale (or why
     * they could not be), for the status bar.
     */
    default void scanSettingsRead(String pointTag, String words) {
    }

    /** Saving failed; the workbook file holds something else than the sheets show. */
    void saveFailed(Exception e);

    /** A recorded maintenance action replaced an element of the point's path in the workbook. */
    void pathReplaced(String pointTag);

    /** A record (inspection, action, note, sign-off) was written or withdrawn at the point. */
    default void recorded(String pointTag) {
    }

    /** Anything else worth a line in the status bar. */
    void failed(Exception e);
}
