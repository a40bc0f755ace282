package org.strandbook.store;

import java.time.DateTimeException;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.Locale;

/**
 * Instants as the workbook stores them: ISO 8601 UTC text with exactly three fraction digits,
 * {@code 2024-03-05T14:07:00.000Z}. A fixed width makes text order equal time order, which the scan
 * index relies on; {@link Instant#toString()} drops zero fractions and would sort "…:00Z" after
 * "…:00.5Z".
 *
 * <p>Years 0000 to 9999 are written and read digit by digit: every scan insert writes two times and
 * every listed scan reads one, and the general formatter costs more there than the rest of the row
 * (it also drags its decimal arithmetic into the JIT compiler's work on every import). Anything
 * else goes through {@link DateTimeFormatter}, with the same result.
 */
final class StoredTime {

    private static final DateTimeFormatter FORMAT =
            DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSS'Z'", Locale.ROOT).withZone(ZoneOffset.UTC);

    /** The stored form's length and the places of its separators. */
    private static final int LENGTH = 24;
    private static final String SEPARATORS = "    -  -  T  :  :  .   Z";

    private static final long FIRST_FAST_SECOND = LocalDate.of(0, 1, 1).toEpochDay() * 86_400;
    private static final long END_FAST_SECOND = LocalDate.of(10_000, 1, 1).toEpochDay() * 86_400;

    private StoredTime() {
    }

    /** The stored text of an instant, truncated to the millisecond. */
    static String format(Instant instant) {
        if (instant == null) {
            throw new IllegalArgumentException("time missing");
        }
        long second = instant.getEpochSecond();
        if (second < FIRST_FAST_SECOND || second >= END_FAST_SECOND) {
            return FORMAT.format(instant.truncatedTo(ChronoUnit.MILLIS));
        }
        long day = Math.floorDiv(second, 86_400);
        int secondOfDay = (int) Math.floorMod(second, 86_400);
        LocalDate date = LocalDate.ofEpochDay(day);
        char[] text = SEPARATORS.toCharArray();
        digits(text, 0, 4, date.getYear());
        digits(text, 5, 2, date.getMonthValue());
        digits(text, 8, 2, date.getDayOfMonth());
        digits(text, 11, 2, secondOfDay / 3600);
        digits(text, 14, 2, secondOfDay / 60 % 60);
        digits(text, 17, 2, secondOfDay % 60);
        digits(text, 20, 3, instant.getNano() / 1_000_000);
        return new String(text);
    }

    static Instant parse(String stored) {
        Instant fast = parseFixedWidth(stored);
        if (fast != null) {
            return fast;
        }
        try {
            return Instant.parse(stored);
        } catch (DateTimeParseException e) {
            throw new WorkbookException("stored time '" + stored + "' is not ISO 8601 UTC", e);
        }
    }

    /** The current time as the audit trail records it. */
    static Instant now() {
        return Instant.now().truncatedTo(ChronoUnit.MILLIS);
    }

    /** The instant of text in exactly the stored form with ordinary field values, or null for anything else. */
    private static Instant parseFixedWidth(String s) {
        if (s == null || s.length() != LENGTH) {
            return null;
        }
        for (int i = 0; i < LENGTH; i++) {
            char c = s.charAt(i);
            char separator = SEPARATORS.charAt(i);
            if (separator == ' ' ? c < '0' || c > '9' : c != separator) {
                return null;
            }
        }
        int hour = number(s, 11, 2);
        int minute = number(s, 14, 2);
        int second = number(s, 17, 2);
        // 24:00 and leap seconds are left to the general parser
        if (hour > 23 || minute > 59 || second > 59) {
            return null;
        }
        LocalDate date;
        try {
            date = LocalDate.of(number(s, 0, 4), number(s, 5, 2), number(s, 8, 2));
        } catch (DateTimeException e) {
            return null;
        }
        return Instant.ofEpochSecond(date.toEpochDay() * 86_400 + hour * 3600L + minute * 60L + second,
                number(s, 20, 3) * 1_000_000L);
    }

    private static void digits(char[] text, int at, int width, int value) {
        for (int i = at + width - 1; i >= at; i--) {
            text[i] = (char) ('0' + value % 10);
            value /= 10;
        }
    }

    private static int number(String s, int at, int width) {
        int value = 0;
        for (int i = at; i < at + width; i++) {
            value = 10 * value + (s.charAt(i) - '0');
        }
        return value;
    }
}
