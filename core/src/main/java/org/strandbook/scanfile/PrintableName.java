package org.strandbook.scanfile;

import java.util.Locale;

/**
 * A file name as a summary or message prints it. Names may hold any character but '/' and NUL: an
 * ESC would let a name recolour or rewrite the terminal, a line break would forge a line of the
 * summary. Such characters are escaped ({@code \n}, {@code \t}, {@code \e}, {@code \x7f},
 * {@code \u0085}), and so is the backslash itself, so the printed name names one file only.
 */
public final class PrintableName {

    private PrintableName() {
    }

    /** {@code name} with control characters escaped; unchanged when it has none. */
    public static String of(String name) {
        int i = 0;
        while (i < name.length() && !needsEscape(name.charAt(i))) {
            i++;
        }
        if (i == name.length()) {
            return name;
        }
        StringBuilder sb = new StringBuilder(name.length() + 8).append(name, 0, i);
        for (; i < name.length(); i++) {
            char c = name.charAt(i);
            if (!needsEscape(c)) {
                sb.append(c);
            } else if (c == '\n') {
                sb.append("\\n");
            } else if (c == '\r') {
                sb.append("\\r");
            } else if (c == '\t') {
                sb.append("\\t");
            } else if (c == 0x1B) {
                sb.append("\\e");
            } else if (c < 0x100) {
                sb.append(String.format(Locale.ROOT, "\\x%02x", (int) c));
            } else {
                sb.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
            }
        }
        return sb.toString();
    }

    private static boolean needsEscape(char c) {
        return Character.isISOControl(c) || c == '\u2028' || c == '\u2029';
    }
}
