package org.strandbook.site;

import java.time.Instant;

/** A free note on the site, or on one point when {@code pointTag} is not empty. */
public record Note(String pointTag, Instant writtenAt, String author, String text) {

    public Note {
        pointTag = pointTag == null ? "" : pointTag.strip();
        author = author == null ? "" : author.strip();
        text = Require.text(text, "note text");
    }
}
