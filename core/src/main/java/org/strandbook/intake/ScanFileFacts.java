package org.strandbook.intake;

import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.DateTimeException;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeFormatterBuilder;
import java.time.temporal.ChronoField;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * What a scan file says about how it was taken, from its labelled records (JCAMP-DX) or its
 * {@code # key: value} header lines (delimited text). Keys are matched ignoring case, blanks and
 * punctuation, with or without JCAMP-DX's leading {@code $} for private labels:
 *
 * <ul>
 *   <li>time taken: {@code LONGDATE} (JCAMP-DX 5.01 form {@code YYYY/MM/DD HH:MM:SS[.SSSS] [±hhmm]},
 *       from memory of Lampen et al., Appl. Spectrosc. 53, 1999), {@code taken_at} or
 *       {@code date_time} (ISO-8601); a time without an offset is UTC. Only read when asked for
 *       ({@link #takenAt()}): a time given on the command makes the file's own irrelevant, right or
 *       wrong;</li>
 *   <li>operator: {@code OWNER} or {@code operator};</li>
 *   <li>integration time: {@code integration_ms} or {@code INTEGRATION TIME MS};</li>
 *   <li>co-added scans: {@code co_added} or {@code CO-ADDED}.</li>
 * </ul>
 */
record ScanFileFacts(Optional<Map.Entry<String, String>> takenAtText, Optional<String> operator,
                     OptionalDouble integrationMs, OptionalInt coAdded) {

    private static final DateTimeFormatter JCAMP_LONGDATE = new DateTimeFormatterBuilder()
            .appendPattern("uuuu/MM/dd HH:mm:ss")
            .optionalStart().appendFraction(ChronoField.NANO_OF_SECOND, 1, 9, true).optionalEnd()
            .toFormatter(Locale.ROOT);

    /** A value in the file that cannot be read, with the file's own key for it (to find its line). */
    static final class FactProblem extends IllegalArgumentException {
        private final String key;

        FactProblem(String key, String message) {
            super(message);
            this.key = key;
        }

        /** The metadata key as written in the file. */
        String key() {
            return key;
        }
    }

    /**
     * When the file says it was taken.
     *
     * @throws FactProblem when the file's time cannot be read
     */
    Optional<Instant> takenAt() {
        return takenAtText.map(e -> {
            try {
                return parseTime(e.getValue());
            } catch (IllegalArgumentException bad) {
                throw new FactProblem(e.getKey(), e.getKey() + ": " + bad.getMessage());
            }
        });
    }

    static ScanFileFacts of(Map<String, String> labelled) {
        // keys are normalised once per file, not once per key looked for: this runs for every imported file
        List<Map.Entry<String, Map.Entry<String, String>>> metadata = new ArrayList<>(labelled.size());
        for (Map.Entry<String, String> e : labelled.entrySet()) {
            metadata.add(Map.entry(normalize(e.getKey()), e));
        }
        Optional<Map.Entry<String, String>> time = find(metadata, "LONGDATE", "TAKENAT", "DATETIME");
        Optional<String> operator = find(metadata, "OPERATOR", "OWNER").map(Map.Entry::getValue)
                .filter(s -> !s.isBlank());
        OptionalDouble integration = find(metadata, "INTEGRATIONMS", "INTEGRATIONTIMEMS")
                .map(ScanFileFacts::number).map(OptionalDouble::of).orElse(OptionalDouble.empty());
        OptionalInt coAdded = find(metadata, "COADDED", "COADDEDSCANS")
                .map(e -> OptionalInt.of((int) Math.round(number(e)))).orElse(OptionalInt.empty());
        return new ScanFileFacts(time, operator, integration, coAdded);
    }

    /**
     * The first entry, in file order, under the first of {@code keys} present, as the file wrote its
     * key, with the value stripped; {@code metadata} pairs each normalised key with its entry.
     */
    private static Optional<Map.Entry<String, String>> find(List<Map.Entry<String, Map.Entry<String, String>>> metadata,
                                                             String... keys) {
        for (String wanted : keys) {
            for (Map.Entry<String, Map.Entry<String, String>> e : metadata) {
                if (e.getKey().equals(wanted)) {
                    return Optional.of(Map.entry(e.getValue().getKey(), e.getValue().getValue().strip()));
                }
            }
        }
        return Optional.empty();
    }

    /** The key in capitals with everything but A-Z and 0-9 left out. */
    private static String normalize(String key) {
        String upper = key.toUpperCase(Locale.ROOT);
        StringBuilder sb = new StringBuilder(upper.length());
        for (int i = 0; i < upper.length(); i++) {
            char c = upper.charAt(i);
            if ((c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9')) {
                sb.append(c);
            }
        }
        return sb.toString();
    }

    private static double number(Map.Entry<String, String> entry) {
        String text = entry.getValue();
        try {
            double v = Double.parseDouble(text.strip().replace(',', '.'));
            if (!Double.isFinite(v) || v < 0) {
                throw new FactProblem(entry.getKey(), entry.getKey() + ": '" + text + "' is not a number of zero or more");
            }
            return v;
        } catch (NumberFormatException e) {
            throw new FactProblem(entry.getKey(), entry.getKey() + ": '" + text + "' is not a number");
        }
    }

    /** ISO-8601 with or without offset, or the JCAMP-DX LONGDATE form; no offset means UTC. */
    static Instant parseTime(String text) {
        String t = text.strip();
        // no ISO-8601 date-time holds a '/': a JCAMP-DX date goes straight to its own form, sparing two
        // thrown exceptions per imported file
        if (t.indexOf('/') < 0) {
            try {
                return OffsetDateTime.parse(t).toInstant();
            } catch (DateTimeParseException ignored) {
                // try the next form
            }
            try {
                return LocalDateTime.parse(t.replace(' ', 'T')).toInstant(ZoneOffset.UTC);
            } catch (DateTimeParseException ignored) {
                // try the JCAMP-DX form
            }
        }
        List<String> parts = words(t);
        Instant plain = plainLongDate(parts);
        if (plain != null) {
            return plain;
        }
        try {
            LocalDateTime local = LocalDateTime.parse(parts.get(0) + " " + (parts.size() > 1 ? parts.get(1) : "00:00:00"),
                    JCAMP_LONGDATE);
            ZoneOffset offset = parts.size() > 2
                    ? ZoneOffset.of(parts.get(2).substring(0, 3) + ":" + parts.get(2).substring(3)) : ZoneOffset.UTC;
            return local.toInstant(offset);
        } catch (DateTimeException | IndexOutOfBoundsException e) {
            throw new IllegalArgumentException("time '" + text + "' is neither ISO-8601 nor YYYY/MM/DD HH:MM:SS");
        }
    }

    /**
     * The usual JCAMP-DX LONGDATE, {@code YYYY/MM/DD HH:MM:SS [±hhmm]} with ordinary field values, read
     * digit by digit as every imported file needs it; null for any other spelling, which the
     * formatter then reads and resolves as it always did.
     */
    private static Instant plainLongDate(List<String> parts) {
        if (parts.size() < 2 || parts.size() > 3 || !shaped(parts.get(0), "0000/00/00")
                || !shaped(parts.get(1), "00:00:00")) {
            return null;
        }
        String date = parts.get(0);
        String time = parts.get(1);
        int hour = decimal(time, 0, 2);
        int minute = decimal(time, 3, 2);
        int second = decimal(time, 6, 2);
        if (hour > 23 || minute > 59 || second > 59) {
            return null;
        }
        int offsetSeconds = 0;
        if (parts.size() == 3) {
            String offset = parts.get(2);
            if (!shaped(offset, "+0000") && !shaped(offset, "-0000")) {
                return null;
            }
            int hours = decimal(offset, 1, 2);
            int minutes = decimal(offset, 3, 2);
            offsetSeconds = hours * 3600 + minutes * 60;
            // the limits ZoneOffset.of applies: at most 18:00, minutes below 60
            if (minutes > 59 || offsetSeconds > 18 * 3600) {
                return null;
            }
            offsetSeconds = offset.charAt(0) == '-' ? -offsetSeconds : offsetSeconds;
        }
        LocalDate day;
        try {
            day = LocalDate.of(decimal(date, 0, 4), decimal(date, 5, 2), decimal(date, 8, 2));
        } catch (DateTimeException e) {
            return null;
        }
        return Instant.ofEpochSecond(day.toEpochDay() * 86_400 + hour * 3600L + minute * 60L + second - offsetSeconds);
    }

    /** True when {@code text} has the shape's length, a digit wherever the shape has 0 and its other characters. */
    private static boolean shaped(String text, String shape) {
        if (text.length() != shape.length()) {
            return false;
        }
        for (int i = 0; i < shape.length(); i++) {
            char c = text.charAt(i);
            if (shape.charAt(i) == '0' ? c < '0' || c > '9' : c != shape.charAt(i)) {
                return false;
            }
        }
        return true;
    }

    private static int decimal(String text, int at, int width) {
        int value = 0;
        for (int i = at; i < at + width; i++) {
            value = 10 * value + (text.charAt(i) - '0');
        }
        return value;
    }

    /**
     * The runs of characters between blanks (space, tab, line breaks, form feed), as
     * {@code split("\\s+")} gives them for stripped text, without compiling a pattern for every
     * imported file.
     */
    private static List<String> words(String text) {
        List<String> out = new ArrayList<>(3);
        int n = text.length();
        int i = 0;
        while (i < n) {
            while (i < n && isBlank(text.charAt(i))) {
                i++;
            }
            int start = i;
            while (i < n && !isBlank(text.charAt(i))) {
                i++;
            }
            if (i > start) {
                out.add(text.substring(start, i));
            }
        }
        return out;
    }

    private static boolean isBlank(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\u000B' || c == '\f' || c == '\r';
    }
}
