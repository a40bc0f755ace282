package org.strandbook.intake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Instant;
import java.util.Map;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** When and by whom a scan was taken, as its file says. */
class ScanFileFactsTest {

    // ISO 8601-1:2019 date-time forms; the last two rows are the JCAMP-DX 5.01 ##LONGDATE form
    // YYYY/MM/DD HH:MM:SS with an optional ±hhmm offset (from memory: Lampen et al., Appl. Spectrosc.
    // 48, 1545 (1994)), and, in JCAMP-DX 5.01, optional decimals of the second, HH:MM:SS.SSSS (from
    // memory: Lampen et al., Appl. Spectrosc. 53, 1999); a time without an offset is UTC by our own rule
    @ParameterizedTest
    @CsvSource(textBlock = """
            2026-03-01T09:30:00Z,          2026-03-01T09:30:00Z
            2026-03-01T10:30:00+01:00,     2026-03-01T09:30:00Z
            2026-03-01T09:30:00,           2026-03-01T09:30:00Z
            2026-03-01 09:30:00,           2026-03-01T09:30:00Z
            2026/03/01 09:30:00,           2026-03-01T09:30:00Z
            2026/03/01 11:30:00 +0200,     2026-03-01T09:30:00Z
            2026/03/01 09:30:00.25,        2026-03-01T09:30:00.250Z
            2026/03/01 10:30:00.1234 +0100, 2026-03-01T09:30:00.1234Z
            """)
    void timeFormsAreRead(String text, String expected) {
        assertEquals(Instant.parse(expected), ScanFileFacts.parseTime(text));
    }

    @Test
    void anUnreadableTimeSaysWhichFormsAreAccepted() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ScanFileFacts.parseTime("first of March"));
        assertEquals("time 'first of March' is neither ISO-8601 nor YYYY/MM/DD HH:MM:SS", e.getMessage());
    }

    @Test
    void jcampPrivateLabelsAndTextHeaderKeysMeanTheSame() {
        ScanFileFacts jcamp = ScanFileFacts.of(Map.of("LONGDATE", "2026/03/01 09:30:00", "OWNER", "A. Tern",
                "$INTEGRATION TIME MS", "50", "$CO-ADDED", "16"));
        ScanFileFacts text = ScanFileFacts.of(Map.of("taken_at", "2026-03-01T09:30:00Z", "operator", "A. Tern",
                "integration_ms", "50", "co_added", "16"));
        assertEquals(jcamp.takenAt(), text.takenAt());
        assertEquals(Instant.parse("2026-03-01T09:30:00Z"), jcamp.takenAt().orElseThrow());
        assertEquals(jcamp.operator(), text.operator());
        assertEquals(jcamp.integrationMs(), text.integrationMs());
        assertEquals(jcamp.coAdded(), text.coAdded());
    }
}
