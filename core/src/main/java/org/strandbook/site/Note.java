package org.strandbook.site;

import java.time.Instant;

/**
 * A free note on the site, on one point when {@code pointTag} is not empty, or on one joint or cable
 * segment of that point when {@code elementLabel} is not empty too.
 */
public record Note(String pointTag, String elementLabel, Instant writtenAt, String author, String text) {

    public Note {
        pointTag = pointTag == null ? "" : pointTag.strip();
        elementLabel = elementLabel == null ? "" : elementLabel.strip();
        if (pointTag.isEmpty() && !elementLabel.isEmpty()) {
            throw new IllegalArgumentException("a note on " + elementLabel + " needs the point it belongs to");
        }
        author = author == null ? "" : author.strip();
        text = Require.text(text, "note text");
    }

    /** A note on the site, or on the whole point. */
    public Note(String pointTag, Instant writtenAt, String author, String text) {
        this(pointTag, "", writtenAt, author, text);
    }

    /** What the note is about, in words: "site", "AT-101" or "AT-101 J2". */
    public String subject() {
        return pointTag.isEmpty() ? "site" : elementLabel.isEmpty() ? pointTag : pointTag + " " + elementLabel;
    }
}
