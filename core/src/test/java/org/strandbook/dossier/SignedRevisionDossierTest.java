package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;
import org.strandbook.store.Workbook;

/**
 * What the dossier says of signatures: the cover carries the signatures of the revision it shows,
 * a change after signing makes it the next, unsigned revision, and a superseded point signature
 * says so, and the cover lists the signatures it no longer carries. That a signed record changed later needs a new revision is common practice for
 * controlled documents (design choice of the letters: A, B, ...).
 */
class SignedRevisionDossierTest {

    private static final Instant SIGNED = DossierFixture.ISSUED.minus(Duration.ofDays(1));

    @TempDir
    Path dir;

    private Workbook wb;

    @BeforeEach
    void create() {
        // the fixture's site is at revision B, already signed PREPARED
        wb = DossierFixture.create(dir.resolve("site.sqlite"), Map.of());
        wb.signOffs().add(new SignOff(SignOffRole.CHECKED, "M. Okonedo", SIGNED, DossierFixture.GOOD, "",
                "commissioning lead", "", ""));
        wb.signOffs().add(new SignOff(SignOffRole.APPROVED, "R. Fairbairn", SIGNED, "", "", "site engineer", "", ""));
    }

    @AfterEach
    void close() {
        wb.close();
    }

    @Test
    void aSignedRevisionShowsItsSignaturesOnTheCover() {
        DossierContent c = DossierFixture.content(wb, DossierScope.everything());
        assertEquals("B", c.site().revision());
        assertEquals("R. Fairbairn", c.signOff(SignOffRole.APPROVED).orElseThrow().name());
        assertEquals(List.of(), c.earlierRevisions());
    }

    @Test
    void aChangeAfterSigningMakesTheDossierTheNextUnsignedRevision() {
        wb.maintenance().add(new MaintenanceAction(DossierFixture.GOOD, MaintenanceKind.CLEAN_JOINT, "J2",
                SIGNED.plus(Duration.ofHours(2)), "T. Okonjo", "", "routine", Optional.empty()));
        DossierContent c = DossierFixture.content(wb, DossierScope.everything());
        assertEquals("C", c.site().revision());
        assertTrue(c.signOff(SignOffRole.APPROVED).isEmpty());
        assertEquals(2, c.earlierRevisions().size(), c.earlierRevisions()::toString);
        assertTrue(c.earlierRevisions().stream().allMatch(line -> line.contains("SUPERSEDED")),
                c.earlierRevisions()::toString);
        DossierPoint good = c.points().stream().filter(p -> p.tag().equals(DossierFixture.GOOD)).findFirst()
                .orElseThrow();
        assertEquals(1, good.actions().size());
        assertTrue(good.signOffs().get(0).remark().contains("SUPERSEDED: point AT-201 changed after it was signed"),
                good.signOffs().get(0).remark());
    }
}
