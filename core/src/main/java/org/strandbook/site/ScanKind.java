package org.strandbook.site;

import java.util.Locale;

/**
 * What a scan is: the lamp through a short patch cord at the analyzer (reference), the light back
 * through the whole point (loop), or the detector with the lamp blocked (dark).
 */
public enum ScanKind {
    REFERENCE,
    LOOP,
    DARK;

    /** The word used on the command line and in files: {@code reference}, {@code loop}, {@code dark}. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static ScanKind fromWord(String word) {
        for (ScanKind k : values()) {
            if (k.word().equalsIgnoreCase(word.strip())) {
                return k;
            }
        }
        throw new IllegalArgumentException("unknown scan kind '" + word + "': use loop, reference or dark");
    }
}
