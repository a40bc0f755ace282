package org.strandbook.app.cli;

import java.math.BigDecimal;
import java.math.MathContext;

/** The little JSON the command line prints: numbers and names, written by hand, locale-free. */
final class JsonText {

    private static final MathContext SIGNIFICANT = new MathContext(10);

    private JsonText() {
    }

    /** A JSON number with at most 10 significant digits, plain notation; null when not finite. */
    static String number(double value) {
        if (!Double.isFinite(value)) {
            return "null";
        }
        if (value == 0) {
            return "0";
        }
        return new BigDecimal(value).round(SIGNIFICANT).stripTrailingZeros().toPlainString();
    }

    /** A JSON string literal. */
    static String string(String s) {
        StringBuilder b = new StringBuilder(s.length() + 2).append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (c < 0x20) {
                        b.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }
}
