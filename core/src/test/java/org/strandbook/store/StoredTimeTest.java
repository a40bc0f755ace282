package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.Locale;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The digit-by-digit stored time against the JDK's general ISO 8601 formatter and parser
 * (java.time, ISO 8601-1:2019 extended format), which wrote and read every stored time before.
 */
class StoredTimeTest {

    private static final DateTimeFormatter REFERENCE =
            DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSS'Z'", Locale.ROOT).withZone(ZoneOffset.UTC);

    // edges of the digit-by-digit range and of days, months, leap years and the epoch
    @ParameterizedTest
    @CsvSource(textBlock = """
            1970-01-01T00:00:00Z
            1969-12-31T23:59:59.999999999Z
            2024-02-29T12:34:56.789Z
            2023-12-31T23:59:59.9995Z
            2000-03-01T00:00:00.001Z
            0000-01-01T00:00:00Z
            9999-12-31T23:59:59.999Z
            +10000-01-01T00:00:00Z
            -0001-12-31T23:59:59.5Z
            """)
    void writesWhatTheGeneralFormatterWritesAndReadsItBack(String iso) {
        Instant t = Instant.parse(iso);
        String stored = StoredTime.format(t);
        assertEquals(REFERENCE.format(t.truncatedTo(ChronoUnit.MILLIS)), stored);
        assertEquals(t.truncatedTo(ChronoUnit.MILLIS), StoredTime.parse(stored));
    }

    @Test
    void agreesWithTheGeneralFormatterOverFourThousandYears() {
        SplittableRandom random = new SplittableRandom(20_240_305L);
        long from = Instant.parse("0001-01-01T00:00:00Z").getEpochSecond();
        long to = Instant.parse("4000-01-01T00:00:00Z").getEpochSecond();
        for (int i = 0; i < 20_000; i++) {
            Instant t = Instant.ofEpochSecond(random.nextLong(from, to), random.nextInt(1_000_000_000));
            String stored = StoredTime.format(t);
            assertEquals(REFERENCE.format(t.truncatedTo(ChronoUnit.MILLIS)), stored, t::toString);
            assertEquals(Instant.parse(stored), StoredTime.parse(stored), stored);
        }
    }

    // forms the fixed-width reader leaves to Instant.parse: no fraction, more digits, a leap second
    @ParameterizedTest
    @CsvSource(textBlock = """
            2024-03-05T14:07:00Z
            2024-03-05T14:07:00.5Z
            2024-03-05T14:07:00.123456Z
            2016-12-31T23:59:60.000Z
            """)
    void readsOtherIsoFormsAsTheGeneralParserDoes(String text) {
        assertEquals(Instant.parse(text), StoredTime.parse(text));
    }

    @ParameterizedTest
    @CsvSource(textBlock = """
            2024-02-30T00:00:00.000Z
            2024-13-01T00:00:00.000Z
            2024-03-05 14:07:00.000Z
            2024-03-05T14:07:00.000+01
            yesterday
            """)
    void refusesTextThatIsNoIsoUtcTime(String text) {
        WorkbookException e = assertThrows(WorkbookException.class, () -> StoredTime.parse(text));
        assertEquals("stored time '" + text + "' is not ISO 8601 UTC", e.getMessage());
    }
}
