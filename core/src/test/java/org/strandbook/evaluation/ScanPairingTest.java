package org.strandbook.evaluation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;

/**
 * The pairing rule of the one-cord reference method: a loop is divided by the reference taken at
 * the same visit, each with its own dark (IEC 61280-4-1 family of methods, from memory: re-reference
 * whenever cords change). The 12 h visit window is a design choice.
 */
class ScanPairingTest {

    private static long ids = 1;

    private static ScanPairing.Pairings pairings(ScanRecord... scans) {
        return ScanPairing.withDefaults().pair(List.of(scans));
    }

    private static ScanRecord scan(String point, ScanKind kind, String at, double integrationMs) {
        return new ScanRecord(ids++, point, kind, Instant.parse(at), new ScanConditions("op", integrationMs, 1,
                OptionalDouble.empty(), OptionalDouble.empty()), 10, 1000, 2000, "f", "");
    }

    @Test
    void loopTakesTheReferenceAndDarkOfItsOwnVisit() {
        ScanRecord oldRef = scan("P1", ScanKind.REFERENCE, "2025-01-01T08:00:00Z", 50);
        ScanRecord dark = scan("P1", ScanKind.DARK, "2025-04-01T08:00:00Z", 50);
        ScanRecord ref = scan("P1", ScanKind.REFERENCE, "2025-04-01T08:05:00Z", 50);
        ScanRecord loop = scan("P1", ScanKind.LOOP, "2025-04-01T08:10:00Z", 50);
        ScanPairing.Pairings p = pairings(loop, oldRef, ref, dark);
        assertEquals(1, p.paired().size());
        ScanPair pair = p.paired().get(0);
        assertEquals(ref, pair.reference());
        assertEquals(dark, pair.loopDark());
        assertEquals(dark, pair.referenceDark());
    }

    @Test
    void loopWithoutAReferenceInItsVisitIsReportedNotGuessed() {
        ScanRecord oldRef = scan("P1", ScanKind.REFERENCE, "2025-01-01T08:00:00Z", 50);
        ScanRecord dark = scan("P1", ScanKind.DARK, "2025-04-01T08:00:00Z", 50);
        ScanRecord loop = scan("P1", ScanKind.LOOP, "2025-04-01T08:10:00Z", 50);
        ScanPairing.Pairings p = pairings(loop, oldRef, dark);
        assertTrue(p.paired().isEmpty());
        assertEquals(1, p.unpaired().size());
        assertTrue(p.unpaired().get(0).reason().startsWith("no reference scan of P1 within 12 h"));
    }

    @Test
    void loopWithoutADarkIsReported() {
        ScanRecord ref = scan("P1", ScanKind.REFERENCE, "2025-04-01T08:05:00Z", 50);
        ScanRecord loop = scan("P1", ScanKind.LOOP, "2025-04-01T08:10:00Z", 50);
        ScanPairing.Pairings p = pairings(loop, ref);
        assertTrue(p.unpaired().get(0).reason().startsWith("no dark scan of P1"));
    }

    @Test
    void darkOfTheSameIntegrationTimeIsPreferredOverANearerOne() {
        ScanRecord dark50 = scan("P1", ScanKind.DARK, "2025-04-01T07:00:00Z", 50);
        ScanRecord dark20 = scan("P1", ScanKind.DARK, "2025-04-01T08:09:00Z", 20);
        ScanRecord ref = scan("P1", ScanKind.REFERENCE, "2025-04-01T08:05:00Z", 50);
        ScanRecord loop = scan("P1", ScanKind.LOOP, "2025-04-01T08:10:00Z", 50);
        ScanPair pair = pairings(dark50, dark20, ref, loop).paired().get(0);
        assertEquals(dark50, pair.loopDark());
    }

    @Test
    void scansOfAnotherPointAreNeverPaired() {
        ScanRecord dark = scan("P2", ScanKind.DARK, "2025-04-01T08:00:00Z", 50);
        ScanRecord ref = scan("P2", ScanKind.REFERENCE, "2025-04-01T08:05:00Z", 50);
        ScanRecord loop = scan("P1", ScanKind.LOOP, "2025-04-01T08:10:00Z", 50);
        assertTrue(pairings(dark, ref, loop).paired().isEmpty());
    }

    @Test
    void eachOfManyVisitsPairsWithinItself() {
        // one-cord method (from memory, as above): each visit's loop is divided by that visit's reference
        List<ScanRecord> scans = new ArrayList<>();
        for (int day = 1; day <= 28; day++) {
            String date = String.format(Locale.ROOT, "2025-02-%02d", day);
            scans.add(scan("P1", ScanKind.LOOP, date + "T08:10:00Z", 50));
            scans.add(scan("P1", ScanKind.REFERENCE, date + "T08:05:00Z", 50));
            scans.add(scan("P1", ScanKind.DARK, date + "T08:00:00Z", 50));
        }
        ScanPairing.Pairings p = ScanPairing.withDefaults().pair(scans);
        assertEquals(28, p.paired().size());
        for (ScanPair pair : p.paired()) {
            LocalDate visit = pair.loop().takenAt().atZone(ZoneOffset.UTC).toLocalDate();
            assertEquals(visit, pair.reference().takenAt().atZone(ZoneOffset.UTC).toLocalDate());
            assertEquals(visit, pair.loopDark().takenAt().atZone(ZoneOffset.UTC).toLocalDate());
        }
    }

    @Test
    void earlierOfTwoEquallyNearReferencesIsTaken() {
        // design choice, and the rule printed with every result: an earlier reference wins a tie
        ScanRecord dark = scan("P1", ScanKind.DARK, "2025-04-01T08:00:00Z", 50);
        ScanRecord before = scan("P1", ScanKind.REFERENCE, "2025-04-01T08:05:00Z", 50);
        ScanRecord loop = scan("P1", ScanKind.LOOP, "2025-04-01T08:10:00Z", 50);
        ScanRecord after = scan("P1", ScanKind.REFERENCE, "2025-04-01T08:15:00Z", 50);
        ScanPair pair = pairings(after, loop, before, dark).paired().get(0);
        assertEquals(before, pair.reference());
    }
}
