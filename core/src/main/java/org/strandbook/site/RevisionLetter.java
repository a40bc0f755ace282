package org.strandbook.site;

import java.util.Locale;

/** Dossier revision marks: A, B, ... Z, AA, AB ...; or 0, 1, 2 ... when the site numbers them. */
public final class RevisionLetter {

    private RevisionLetter() {
    }

    /** The revision after {@code revision}: "A" → "B", "Z" → "AA", "3" → "4". */
    public static String next(String revision) {
        String r = revision == null ? "" : revision.strip().toUpperCase(Locale.ROOT);
        if (r.matches("[0-9]{1,9}")) {
            return Integer.toString(Integer.parseInt(r) + 1);
        }
        if (!r.matches("[A-Z]+")) {
            throw new IllegalArgumentException("revision '" + revision
                    + "' is neither letters (A, B, ... AA) nor a number, so Strandbook cannot advance it");
        }
        char[] c = r.toCharArray();
        for (int i = c.length - 1; i >= 0; i--) {
            if (c[i] != 'Z') {
                c[i]++;
                return new String(c);
            }
            c[i] = 'A';
        }
        return "A" + new String(c);
    }
}
