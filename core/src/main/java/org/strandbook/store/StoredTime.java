package org.strandbook.store;

import java.time.Instant;
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
 */
final class StoredTime {

    private static final DateTimeFormatter FORMAT =
            DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSS'Z'", Locale.ROOT).withZone(ZoneOffset.UTC);

    private StoredTime() {
    }

    /** The stored text of an instant, truncated to the millisecond. */
    static String format(Instant instant) {
        if (instant == null) {
            throw new IllegalArgumentException("time missing");
        }
        return FORMAT.format(instant.truncatedTo(ChronoUnit.MILLIS));
    }

    static Instant parse(String stored) {
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
}
