package org.strandbook.app.ui.workbook;

/** A node of the site tree. */
record SiteEntry(Kind kind, String tag, String text) {

    enum Kind { SITE, ANALYZER, POINT }

    @Override
    public String toString() {
        return text;
    }
}
