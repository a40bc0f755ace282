package org.strandbook.handover;

import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;

/**
 * The time a person types for a record made in the field: an ISO-8601 instant, a date and time
 * (UTC; a space may stand for the "T"), or a date alone (noon UTC, so the day is the same in every
 * time zone of a plant). Empty means now.
 */
public final class RecordedTime {

    private RecordedTime() {
    }

    /** @throws IllegalArgumentException naming the accepted forms */
    public static Instant parse(String text) {
        if (text == null || text.isBlank()) {
            return Instant.now();
        }
        String t = text.strip().replace(' ', 'T');
        try {
            if (t.endsWith("Z") || t.matches(".*[+-]\\d\\d:\\d\\d$")) {
                return OffsetDateTime.parse(t).toInstant();
            }
            if (t.contains("T")) {
                return LocalDateTime.parse(t).toInstant(ZoneOffset.UTC);
            }
            return LocalDate.parse(t).atTime(12, 0).toInstant(ZoneOffset.UTC);
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException("'" + text + "' is not a date (2026-05-03), a date and time in UTC "
                    + "(2026-05-03 10:15) or an ISO-8601 instant (2026-05-03T10:15:00Z)", e);
        }
    }
}
