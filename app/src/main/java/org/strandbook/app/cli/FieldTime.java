package org.strandbook.app.cli;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.Locale;

import org.strandbook.handover.RecordedTime;

/** The {@code --at} time of a record made in the field (see {@link RecordedTime}); a bad one is wrong usage. */
final class FieldTime {

    /** A moment as the tables print it: to the minute, UTC. */
    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private FieldTime() {
    }

    /** A moment for a table, to the minute in UTC (the column or line says UTC). */
    static String shown(Instant at) {
        return SHOWN.format(at);
    }

    /**
     * The start of a span asked for on the command line: a date alone is that day's first instant in
     * UTC ("changed since 2026-05-03" includes the whole of the 3rd), not a record's noon.
     */
    static Instant since(String option, String text) {
        String t = text.strip();
        if (t.matches("\\d{4}-\\d{2}-\\d{2}")) {
            try {
                return LocalDate.parse(t).atStartOfDay(ZoneOffset.UTC).toInstant();
            } catch (DateTimeParseException e) {
                throw new UsageProblem(option + " '" + text + "' is not a date (YYYY-MM-DD)");
            }
        }
        return parse(option, text);
    }

    static Instant parse(String option, String text) {
        try {
            return RecordedTime.parse(text);
        } catch (IllegalArgumentException e) {
            throw new UsageProblem(option + " " + e.getMessage());
        }
    }
}
