package org.strandbook.scanfile;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntFunction;

/**
 * Writes integer ordinates as JCAMP-DX {@code (X++(Y..Y))} lines, in AFFN or in DIFDUP form.
 *
 * <p>DIFDUP after McDonald &amp; Wilks, Appl. Spectrosc. 42, 151 (1988), section 5 and Table VII:
 * each line starts with the abscissa of its first ordinate and that ordinate in SQZ form; the
 * following ordinates are differences (DIF), and a run of equal differences is one DIF token and a
 * DUP count (the count includes the first). Every line after the first repeats, as its first
 * ordinate, the last ordinate of the line before: the Y-value check. The table closes with a check
 * line holding only the last abscissa and the last ordinate, so that the last line is checked too.
 */
final class AsdfEncoder {

    /** Lines are kept to 80 characters, as the format asks. */
    static final int MAX_LINE_LENGTH = 80;

    private AsdfEncoder() {
    }

    /**
     * The DIFDUP lines of a table.
     *
     * @param ordinates    the ordinates as integers (value ÷ YFACTOR, rounded), at least one
     * @param abscissaText the printed abscissa of ordinate {@code i} (already ÷ XFACTOR)
     */
    static List<String> difDupLines(long[] ordinates, IntFunction<String> abscissaText) {
        List<String> lines = new ArrayList<>();
        int n = ordinates.length;
        int first = 0;
        StringBuilder token = new StringBuilder(24);
        while (true) {
            StringBuilder line = new StringBuilder(MAX_LINE_LENGTH + 8);
            line.append(abscissaText.apply(first));
            appendSqz(line, ordinates[first]);
            int last = first;
            while (last + 1 < n) {
                long difference = ordinates[last + 1] - ordinates[last];
                int run = 1;
                while (last + run + 1 < n && ordinates[last + run + 1] - ordinates[last + run] == difference) {
                    run++;
                }
                token.setLength(0);
                appendDif(token, difference);
                if (run > 1) {
                    appendDup(token, run);
                }
                // one token always goes in, so that a line can never stay empty
                if (line.length() + token.length() > MAX_LINE_LENGTH && last > first) {
                    break;
                }
                line.append(token);
                last += run;
            }
            lines.add(line.toString());
            if (last == n - 1) {
                if (last > first) {
                    StringBuilder check = new StringBuilder();
                    check.append(abscissaText.apply(n - 1));
                    appendSqz(check, ordinates[n - 1]);
                    lines.add(check.toString());
                }
                return lines;
            }
            first = last;
        }
    }

    /** The AFFN lines of a table: abscissa, then blank-separated integers, at most 80 characters a line. */
    static List<String> affnLines(long[] ordinates, IntFunction<String> abscissaText) {
        List<String> lines = new ArrayList<>();
        int n = ordinates.length;
        int i = 0;
        while (i < n) {
            StringBuilder line = new StringBuilder(MAX_LINE_LENGTH + 24);
            line.append(abscissaText.apply(i));
            int onLine = 0;
            while (i < n) {
                String value = Long.toString(ordinates[i]);
                if (onLine > 0 && line.length() + 1 + value.length() > MAX_LINE_LENGTH) {
                    break;
                }
                line.append(' ').append(value);
                onLine++;
                i++;
            }
            lines.add(line.toString());
        }
        return lines;
    }

    static void appendSqz(StringBuilder sb, long value) {
        appendPseudo(sb, value, "@ABCDEFGHI", "@abcdefghi");
    }

    static void appendDif(StringBuilder sb, long difference) {
        appendPseudo(sb, difference, "%JKLMNOPQR", "%jklmnopqr");
    }

    /** A DUP count ≥ 2: the leading digit as {@code S..Z,s} (1..9), the rest as ASCII digits. */
    static void appendDup(StringBuilder sb, long count) {
        if (count < 2) {
            throw new IllegalArgumentException("a DUP count repeats at least once, was " + count);
        }
        String digits = Long.toString(count);
        int lead = digits.charAt(0) - '0';
        sb.append(lead == 9 ? 's' : (char) ('S' + lead - 1)).append(digits, 1, digits.length());
    }

    private static void appendPseudo(StringBuilder sb, long value, String positive, String negative) {
        if (value == Long.MIN_VALUE) {
            throw new IllegalArgumentException("ordinate out of range: " + value);
        }
        String digits = Long.toString(Math.abs(value));
        int lead = digits.charAt(0) - '0';
        sb.append(value < 0 ? negative.charAt(lead) : positive.charAt(lead)).append(digits, 1, digits.length());
    }
}
