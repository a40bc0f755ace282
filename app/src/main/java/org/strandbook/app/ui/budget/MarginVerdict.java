package org.strandbook.app.ui.budget;

import org.strandbook.app.ui.sheet.Verdict;

/**
 * The status of a point's predicted margin (allowed minus predicted loss). A Strandbook design
 * choice: a margin smaller than the point's acceptance tolerance cannot be told apart from a
 * failing path once measured, so it asks for review.
 */
public final class MarginVerdict {

    private MarginVerdict() {
    }

    /** PASS when {@code marginDb ≥ toleranceDb}, REVIEW when 0 ≤ margin &lt; tolerance, FAIL below 0. */
    public static Verdict of(double marginDb, double toleranceDb) {
        if (marginDb < 0) {
            return Verdict.FAIL;
        }
        return marginDb >= toleranceDb ? Verdict.PASS : Verdict.REVIEW;
    }
}
