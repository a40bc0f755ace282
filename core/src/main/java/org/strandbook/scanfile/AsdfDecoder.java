package org.strandbook.scanfile;

/**
 * Decodes the data lines of a JCAMP-DX table: AFFN and the ASCII squeezed difference forms (ASDF).
 *
 * <p>After McDonald &amp; Wilks, "JCAMP-DX: A Standard Form for Exchange of Infrared Spectra in
 * Computer Readable Form", Appl. Spectrosc. 42, 151 (1988), section 5 and Table VII:
 * <ul>
 *   <li>AFFN: free-format decimals separated by blanks or commas; a leading + or − also separates
 *       (PAC form). An {@code E} is an exponent only when followed by + or −; otherwise it is the
 *       SQZ digit 5. A lower-case {@code e} followed by + or − is read as an exponent too, because
 *       general-purpose number formatters write it and no ASDF encoder follows a negative SQZ digit
 *       with a PAC number.</li>
 *   <li>SQZ: {@code @ A-I} = 0..9, {@code a-i} = −1..−9 as the leading digit of an absolute value.</li>
 *   <li>DIF: {@code % J-R} = 0..9, {@code j-r} = −1..−9 as the leading digit of a difference to the
 *       previous ordinate.</li>
 *   <li>DUP: {@code S-Z} = 1..8, {@code s} = 9 as the leading digit of a repeat count of the previous
 *       token (the count includes that token); after a DIF token the difference is repeated.</li>
 * </ul>
 * Further digits of a multi-digit value are plain ASCII digits. The decoder keeps state between
 * calls only in its buffers; one instance serves one file and is not thread-safe. It does no
 * regular-expression matching and no splitting: one pass over the characters of a line.
 */
final class AsdfDecoder {

    /** A data line that breaks the JCAMP-DX syntax; the message names the column. */
    static final class SyntaxError extends Exception {
        SyntaxError(String message) {
            super(message, null, false, false);
        }
    }

    private static final double[] POWERS_OF_TEN = new double[23];

    static {
        POWERS_OF_TEN[0] = 1;
        for (int i = 1; i < POWERS_OF_TEN.length; i++) {
            POWERS_OF_TEN[i] = POWERS_OF_TEN[i - 1] * 10;
        }
    }

    private static final int NONE = 0;
    private static final int ABSOLUTE = 1;
    private static final int DIFFERENCE = 2;

    private double[] ordinates = new double[128];
    private int count;
    private double abscissa;
    private double abscissaQuantum;
    private boolean endsInDif;

    /** The line being decoded, copied into a reused buffer: array reads are cheaper than charAt per character. */
    private char[] text = new char[128];
    private int end;
    private int pos;
    private double lastQuantum;

    /**
     * Decodes one {@code (X++(Y..Y))} line: an AFFN abscissa, then ordinates in any mix of AFFN, PAC,
     * SQZ, DIF and DUP.
     *
     * @param line         the line with any {@code $$} comment already removed; not blank
     * @param maxOrdinates the most ordinates this line may hold (guards against a DUP count that
     *                     would fill memory)
     */
    void decodeXyDataLine(CharSequence line, int maxOrdinates) throws SyntaxError {
        start(line);
        skipSeparators(false);
        if (pos >= end) {
            throw new SyntaxError("empty data line");
        }
        if (!isAffnStart(text[pos])) {
            throw new SyntaxError("a data line must start with its abscissa (X value), found "
                    + describe(text[pos]) + " (column " + (pos + 1) + ")");
        }
        abscissa = readAffn();
        abscissaQuantum = lastQuantum;
        int lastKind = NONE;
        boolean lastWasDup = false;
        double lastDifference = 0;
        while (true) {
            skipSeparators(false);
            if (pos >= end) {
                break;
            }
            char c = text[pos];
            int column = pos + 1;
            if (isAffnStart(c)) {
                add(readAffn(), maxOrdinates);
                lastKind = ABSOLUTE;
                lastWasDup = false;
            } else if (c == '@' || (c >= 'A' && c <= 'I') || (c >= 'a' && c <= 'i')) {
                add(readPseudoDigits(sqzDigit(c)), maxOrdinates);
                lastKind = ABSOLUTE;
                lastWasDup = false;
            } else if (c == '%' || (c >= 'J' && c <= 'R') || (c >= 'j' && c <= 'r')) {
                if (count == 0) {
                    throw new SyntaxError("DIF character '" + c + "' (column " + column
                            + ") starts the ordinates: the first ordinate of a line must be an absolute value");
                }
                double difference = readPseudoDigits(difDigit(c));
                add(finite(ordinates[count - 1] + difference, column), maxOrdinates);
                lastDifference = difference;
                lastKind = DIFFERENCE;
                lastWasDup = false;
            } else if ((c >= 'S' && c <= 'Z') || c == 's') {
                if (count == 0) {
                    throw new SyntaxError("DUP character '" + c + "' (column " + column + ") has nothing to repeat");
                }
                if (lastWasDup) {
                    throw new SyntaxError("DUP character '" + c + "' (column " + column + ") follows another DUP count");
                }
                double repeat = readPseudoDigits(c == 's' ? 9 : c - 'S' + 1);
                if (repeat != Math.rint(repeat) || repeat < 1) {
                    throw new SyntaxError("DUP count at column " + column + " is not a whole number ≥ 1");
                }
                if (count + repeat - 1 > maxOrdinates) {
                    throw new SyntaxError("DUP count " + NumberField.plain(repeat) + " at column " + column
                            + " gives more ordinates than ##NPOINTS= allows");
                }
                for (long k = 1; k < (long) repeat; k++) {
                    double previous = ordinates[count - 1];
                    add(lastKind == DIFFERENCE ? finite(previous + lastDifference, column) : previous, maxOrdinates);
                }
                lastWasDup = true;
            } else if (c == '?') {
                throw new SyntaxError("'?' (value unknown) at column " + column + ": a spectrum needs every ordinate");
            } else {
                throw new SyntaxError("unexpected " + describe(c) + " at column " + column);
            }
        }
        endsInDif = lastKind == DIFFERENCE;
    }

    /**
     * Decodes one {@code (XY..XY)} line: AFFN numbers separated by blanks, commas or semicolons.
     * All numbers land in the ordinate buffer, abscissae and ordinates alternating.
     */
    void decodeAffnLine(CharSequence line, int maxNumbers) throws SyntaxError {
        start(line);
        while (true) {
            skipSeparators(true);
            if (pos >= end) {
                break;
            }
            char c = text[pos];
            if (c == '?') {
                throw new SyntaxError("'?' (value unknown) at column " + (pos + 1) + ": a spectrum needs every value");
            }
            if (!isAffnStart(c)) {
                throw new SyntaxError("unexpected " + describe(c) + " at column " + (pos + 1)
                        + " (##XYPOINTS= data must be plain numbers)");
            }
            add(readAffn(), maxNumbers);
        }
        endsInDif = false;
    }

    /** Number of ordinates (or numbers) decoded from the last line. */
    int count() {
        return count;
    }

    double ordinate(int index) {
        return ordinates[index];
    }

    /** The abscissa at the start of the last {@code (X++(Y..Y))} line, as written (before XFACTOR). */
    double abscissa() {
        return abscissa;
    }

    /** The resolution of the abscissa as printed: 1 for "1000", 0.01 for "1000.25". */
    double abscissaQuantum() {
        return abscissaQuantum;
    }

    /** True if the last line ended in DIF form, so the next line must repeat its last ordinate. */
    boolean endsInDif() {
        return endsInDif;
    }

    private void start(CharSequence line) {
        int length = line.length();
        if (text.length < length) {
            text = new char[Math.max(length, 2 * text.length)];
        }
        if (line instanceof String s) {
            s.getChars(0, length, text, 0);
        } else {
            for (int i = 0; i < length; i++) {
                text[i] = line.charAt(i);
            }
        }
        end = length;
        pos = 0;
        count = 0;
        endsInDif = false;
    }

    private void skipSeparators(boolean semicolonToo) {
        while (pos < end) {
            char c = text[pos];
            if (c == ' ' || c == '\t' || c == ',' || (semicolonToo && c == ';')) {
                pos++;
            } else {
                return;
            }
        }
    }

    private void add(double value, int max) throws SyntaxError {
        if (count >= max) {
            throw new SyntaxError("more values on this line than ##NPOINTS= allows");
        }
        if (count == ordinates.length) {
            ordinates = java.util.Arrays.copyOf(ordinates, ordinates.length * 2);
        }
        ordinates[count++] = value;
    }

    private static boolean isAffnStart(char c) {
        return (c >= '0' && c <= '9') || c == '+' || c == '-' || c == '.';
    }

    private static int sqzDigit(char c) {
        if (c == '@') {
            return 0;
        }
        return c <= 'I' ? c - 'A' + 1 : -(c - 'a' + 1);
    }

    private static int difDigit(char c) {
        if (c == '%') {
            return 0;
        }
        return c <= 'R' ? c - 'J' + 1 : -(c - 'j' + 1);
    }

    /** Reads an AFFN number at {@code pos}; sets {@link #lastQuantum}. */
    private double readAffn() throws SyntaxError {
        int start = pos;
        boolean negative = false;
        char c = text[pos];
        if (c == '+' || c == '-') {
            negative = c == '-';
            pos++;
        }
        long mantissa = 0;
        int digits = 0;
        int decimals = 0;
        boolean point = false;
        while (pos < end) {
            c = text[pos];
            if (c >= '0' && c <= '9') {
                if (digits < 18) {
                    mantissa = mantissa * 10 + (c - '0');
                }
                digits++;
                if (point) {
                    decimals++;
                }
                pos++;
            } else if (c == '.' && !point) {
                point = true;
                pos++;
            } else {
                break;
            }
        }
        if (digits == 0) {
            throw new SyntaxError(NumberField.quote(new String(text, start, Math.min(end, pos + 1) - start))
                    + " at column " + (start + 1) + " is not a number");
        }
        int exponent = 0;
        boolean hasExponent = false;
        if (pos + 1 < end && (text[pos] == 'E' || text[pos] == 'e')
                && (text[pos + 1] == '+' || text[pos + 1] == '-')) {
            boolean negativeExponent = text[pos + 1] == '-';
            pos += 2;
            int exponentDigits = 0;
            while (pos < end && NumberField.isDigit(text[pos])) {
                if (exponentDigits < 6) {
                    exponent = exponent * 10 + (text[pos] - '0');
                }
                exponentDigits++;
                pos++;
            }
            if (exponentDigits == 0) {
                throw new SyntaxError("exponent without digits at column " + (start + 1));
            }
            exponent = negativeExponent ? -exponent : exponent;
            hasExponent = true;
        }
        double value;
        if (hasExponent || digits > 15 || decimals >= POWERS_OF_TEN.length) {
            value = Double.parseDouble(new String(text, start, pos - start));
        } else {
            value = decimals == 0 ? mantissa : mantissa / POWERS_OF_TEN[decimals];
            value = negative ? -value : value;
        }
        lastQuantum = Math.pow(10, exponent - decimals);
        return finite(value, start + 1);
    }

    /**
     * Reads a value whose leading digit is the pseudo-digit at {@code pos} (its signed value given)
     * followed by plain digits and, leniently, a decimal point with more digits.
     */
    private double readPseudoDigits(int signedFirstDigit) throws SyntaxError {
        // the usual token: a few plain digits, read with locals and no double arithmetic
        char[] t = text;
        int p = pos + 1;
        long whole = Math.abs(signedFirstDigit);
        int wholeDigits = 1;
        while (p < end && wholeDigits < 18) {
            int d = t[p] - '0';
            if (d < 0 || d > 9) {
                break;
            }
            whole = whole * 10 + d;
            wholeDigits++;
            p++;
        }
        if (p >= end || (t[p] != '.' && (t[p] < '0' || t[p] > '9'))) {
            pos = p;
            return signedFirstDigit < 0 ? -(double) whole : (double) whole;
        }
        return readPseudoDigitsInFull(signedFirstDigit);
    }

    /** {@link #readPseudoDigits} for tokens with a decimal point or 18 digits and more. */
    private double readPseudoDigitsInFull(int signedFirstDigit) throws SyntaxError {
        int start = pos;
        pos++;
        boolean negative = signedFirstDigit < 0;
        long mantissa = Math.abs(signedFirstDigit);
        int digits = 1;
        int decimals = 0;
        boolean point = false;
        boolean exact = true;
        double big = mantissa;
        while (pos < end) {
            char c = text[pos];
            if (c >= '0' && c <= '9') {
                if (digits < 18) {
                    mantissa = mantissa * 10 + (c - '0');
                } else {
                    exact = false;
                }
                big = big * 10 + (c - '0');
                digits++;
                if (point) {
                    decimals++;
                }
                pos++;
            } else if (c == '.' && !point) {
                point = true;
                pos++;
            } else {
                break;
            }
        }
        double value = exact ? mantissa : big;
        if (decimals > 0) {
            value = decimals < POWERS_OF_TEN.length ? value / POWERS_OF_TEN[decimals] : value / Math.pow(10, decimals);
        }
        return finite(negative ? -value : value, start + 1);
    }

    private static double finite(double value, int column) throws SyntaxError {
        if (!Double.isFinite(value)) {
            throw new SyntaxError("number at column " + column + " is too large to store");
        }
        return value;
    }

    private static String describe(char c) {
        if (c > ' ' && c < 0x7F) {
            return "character '" + c + "'";
        }
        return String.format(java.util.Locale.ROOT, "character U+%04X", (int) c);
    }
}
