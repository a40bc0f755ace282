package org.strandbook.site;

import java.util.Locale;

/**
 * A signed decimal as reports print a change: {@code +0.12}, {@code -0.40}, and {@code +0.00} for
 * anything that rounds to zero. {@code String.format("%+.2f", -0.001)} gives {@code -0.00}, which
 * on a trend line or a deviation reads as a loss that is not there.
 */
public final class SignedDecimal {

    private SignedDecimal() {
    }

    /** {@code value} with an explicit sign and {@code digits} decimals (half-up, as {@link String#format}). */
    public static String of(double value, int digits) {
        String s = String.format(Locale.ROOT, "%+." + digits + "f", value);
        return s.startsWith("-") && isZero(s) ? "+" + s.substring(1) : s;
    }

    private static boolean isZero(String signed) {
        for (int i = 1; i < signed.length(); i++) {
            char c = signed.charAt(i);
            if (c != '0' && c != '.') {
                return false;
            }
        }
        return true;
    }
}
