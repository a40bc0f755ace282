package org.strandbook.dossier;

/** Where charts sit on their sheets: how wide and tall, and how many fit one printed page. */
final class ChartPlacement {

    /** Columns a spectrum chart spans from column A; the template gives them their widths. */
    static final int COLUMNS = 12;

    /** Rows a spectrum chart spans: with its caption, one landscape page. */
    static final int SPECTRUM_ROWS = 30;

    /** Rows a trend chart spans. */
    static final int TREND_ROWS = 26;


    private ChartPlacement() {
    }
}
