package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.Stream;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.Note;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;
import org.strandbook.site.Site;
import org.strandbook.site.WavelengthBand;
import org.strandbook.store.AuditEntry;
import org.strandbook.store.Workbook;

/**
 * Text typed by users reaches the dossier in cells that no spreadsheet program evaluates: every
 * payload stays a string cell, quote-prefixed, wherever it lands. The lead characters are those of
 * the OWASP "CSV Injection" guidance: = + - @ tab and carriage return; the payloads are the usual
 * examples of it (a hyperlink that leaks data, a DDE command, arithmetic).
 */
class FormulaInjectionTest {

    static final String HYPERLINK = "=HYPERLINK(\"http://example.invalid\",\"x\")";
    static final String DDE = "=cmd|' /C calc'!A0";
    static final String PLUS = "+SUM(1,2)";
    static final String MINUS = "-1+2";
    static final String AT = "@SUM(1,2)";
    static final String TAB = "\t=1+1";
    static final String CR = "\r=1+1";
    static final String TAG = "AT-301";

    @TempDir
    static Path dir;

    private static XSSFWorkbook exported;

    @BeforeAll
    static void export() throws IOException {
        Path file = dir.resolve("site.sqlite");
        try (Workbook wb = Workbook.create(file, new Site(DDE + " Works"), DossierFixture.USER)) {
            var catalog = DossierFixture.catalog();
            wb.site().addAnalyzer(DossierFixture.analyzer());
            catalog.fiberTypes().values().forEach(wb.catalog()::addFiberType);
            catalog.connectorTypes().values().forEach(wb.catalog()::addConnectorType);
            catalog.probeTypes().values().forEach(wb.catalog()::addProbeType);
            wb.points().add(new MeasurementPoint(TAG, PLUS, MINUS, "QA-9", 1, "TX-5",
                    List.of(new WavelengthBand(AT, 1650, 1800)), OptionalDouble.empty(), false, false,
                    OptionalDouble.empty()));
            wb.paths().replaceLegs(TAG, DossierFixture.legs(TAG));
            Instant t = Instant.parse("2025-03-01T10:00:00Z");
            wb.notes().add(new Note(TAG, t, "k.ashdown", HYPERLINK));
            wb.inspections().add(new Inspection(TAG, "J2", t, MINUS, InspectionGrade.DIRTY, ""));
            wb.signOffs().add(new SignOff(SignOffRole.CHECKED, DDE, t, "", ""));
            DossierContent read = DossierFixture.content(wb, DossierScope.everything());
            // records strip leading blanks; the audit trail of another program need not, so tab and CR come in there
            List<AuditEntry> audit = List.of(new AuditEntry(1, t, TAB, CR, "note", "1", null, HYPERLINK, null,
                    "0".repeat(64), "f".repeat(64)));
            DossierContent content = new DossierContent(read.site(), read.analyzers(), read.catalog(), read.scope(),
                    read.points(), read.pairingRule(), read.siteNotes(), read.siteSignOffs(),
                    new AuditAppendix(1, "f".repeat(64), true, List.of(), (after, limit) -> after == 0 ? audit : List.of()),
                    read.issuedAt(), read.software(), read.workbookName());
            Path out = dir.resolve("dossier.xlsx");
            DossierWriter.withShippedTemplate().write(content, out, false, DossierProgress.NONE);
            try (DossierFile f = new DossierFile(out)) {
                exported = f.workbook();
            }
        }
    }

    @AfterAll
    static void close() throws IOException {
        exported.close();
    }

    static Stream<Arguments> payloads() {
        return Stream.of(
                Arguments.of(HYPERLINK, "Findings and actions", "a note on the point"),
                Arguments.of(HYPERLINK, "Audit log", "a row image of the audit trail"),
                Arguments.of(DDE, "Cover", "a sign-off name"),
                Arguments.of(PLUS, "Point register", "a point's service"),
                Arguments.of(PLUS, "Acceptance", "a point's service"),
                Arguments.of(MINUS, "Point register", "a point's location"),
                Arguments.of(MINUS, "Cable schedule", "an inspector's name"),
                Arguments.of(AT, "Acceptance", "a band name"),
                Arguments.of(AT, "Spectra", "a band name"),
                Arguments.of(TAB, "Audit log", "a user name"),
                Arguments.of(CR, "Audit log", "an action"));
    }

    @ParameterizedTest(name = "{2} on ''{1}''")
    @MethodSource("payloads")
    void userTextStaysAQuotePrefixedStringCell(String payload, String sheet, String what) {
        List<Cell> cells = cellsHolding(sheet, payload);
        assertFalse(cells.isEmpty(), () -> what + " not found on " + sheet);
        for (Cell c : cells) {
            assertEquals(CellType.STRING, c.getCellType(), c.getAddress().toString());
            assertTrue(c.getCellStyle().getQuotePrefixed(), c.getAddress() + " is quote-prefixed");
        }
    }

    @Test
    void theSiteNameInThePageHeaderIsPlainText() {
        // a header is not a cell; only '&' starts a code there, and the name carries none
        assertTrue(exported.getSheet("Acceptance").getHeader().getLeft().startsWith(DDE));
    }

    @Test
    void noCellOfTheDossierIsAFormula() {
        for (int s = 0; s < exported.getNumberOfSheets(); s++) {
            for (Row row : exported.getSheetAt(s)) {
                for (Cell cell : row) {
                    assertFalse(cell.getCellType() == CellType.FORMULA, cell.getAddress() + " on "
                            + exported.getSheetName(s));
                }
            }
        }
    }

    @Test
    void ordinaryTextIsNotQuotePrefixed() {
        // the prefix marks only text that needs it, so a reader's own formulas referring to tags still work
        List<Cell> tags = cellsHolding("Point register", TAG);
        assertFalse(tags.isEmpty());
        tags.forEach(c -> assertFalse(c.getCellStyle().getQuotePrefixed(), c.getAddress().toString()));
    }

    private static List<Cell> cellsHolding(String sheet, String text) {
        List<Cell> out = new ArrayList<>();
        for (Row row : exported.getSheet(sheet)) {
            for (Cell cell : row) {
                if (cell.getCellType() == CellType.STRING && cell.getStringCellValue().equals(text)) {
                    out.add(cell);
                }
            }
        }
        return out;
    }
}
