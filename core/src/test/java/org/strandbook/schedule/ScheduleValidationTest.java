package org.strandbook.schedule;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.strandbook.schedule.ScheduleFixture.blank;
import static org.strandbook.schedule.ScheduleFixture.cell;
import static org.strandbook.schedule.ScheduleFixture.set;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.strandbook.templates.Templates;

/**
 * Every schedule rule, each broken once in an otherwise valid schedule (the invented plant of
 * {@link ScheduleFixture}), checked by the exact line the user sees, address included. Unless a
 * comment names a standard, the rule is Strandbook's own and is written on the template's Read me
 * sheet, the contractor's reference.
 */
class ScheduleValidationTest {

    @TempDir
    Path folder;

    private final CableScheduleReader reader = new CableScheduleReader();

    private List<String> problemsAfter(Consumer<XSSFWorkbook> edit) throws IOException {
        return ScheduleFixture.lines(reader.read(ScheduleFixture.writeEdited(folder, edit)));
    }

    private static Consumer<XSSFWorkbook> removeRow(String sheet, int rowNumber) {
        return wb -> {
            Sheet s = wb.getSheet(sheet);
            s.removeRow(s.getRow(rowNumber - 1));
        };
    }

    // --- segments -------------------------------------------------------------------------

    @Test
    void negativeLengthIsRejected() throws IOException {
        assertEquals(List.of("Segments!F3: length must be a positive number of metres, was -3"),
                problemsAfter(set("Segments", "F3", -3)));
    }

    @Test
    void missingLengthIsRejected() throws IOException {
        assertEquals(List.of("Segments!F3: length is missing: enter a number of metres"),
                problemsAfter(blank("Segments", "F3")));
    }

    @Test
    void nonNumericLengthIsRejected() throws IOException {
        assertEquals(List.of("Segments!F3: length must be a number of metres, was 'twelve'"),
                problemsAfter(set("Segments", "F3", "twelve")));
    }

    // ISO 80000-1:2009 (numbers) groups digits with a space, never a comma or point, so "1,234"
    // written by someone who groups with commas would silently become 1.234 m: it is refused.
    @Test
    void lengthWithCommaBeforeThreeDigitsIsRejectedAsAmbiguous() throws IOException {
        assertEquals(List.of("Segments!F3: length '1,234' is ambiguous (thousands separator or decimal sign?):"
                        + " enter it as a number cell, or without grouping"),
                problemsAfter(set("Segments", "F3", "1,234")));
    }

    @Test
    void absurdlyLongSegmentIsRejected() throws IOException {
        assertEquals(List.of("Segments!F3: length must be at most 10000 metres, was 1E+308"),
                problemsAfter(set("Segments", "F3", 1e308)));
    }

    @Test
    void errorValueInLengthIsReportedOnce() throws IOException {
        assertEquals(List.of("Segments!F3: the cell holds the error value #DIV/0!"),
                problemsAfter(wb -> cell(wb, "Segments", "F3").setCellErrorValue(FormulaError.DIV0.getCode())));
    }

    @Test
    void unknownFiberTypeIsRejected() throws IOException {
        assertEquals(List.of("Segments!E3: unknown fiber type 'SI999-LOH': not in the catalog nor on sheet"
                        + " 'Fiber types'"),
                problemsAfter(set("Segments", "E3", "SI999-LOH")));
    }

    @Test
    void fiberTypeInWrongLetterCaseGetsAHint() throws IOException {
        assertEquals(List.of("Segments!E3: unknown fiber type 'si400-loh': not in the catalog nor on sheet"
                        + " 'Fiber types' (did you mean 'SI400-LOH'? letter case counts)"),
                problemsAfter(set("Segments", "E3", "si400-loh")));
    }

    @Test
    void duplicateCableIdIsRejected() throws IOException {
        assertEquals(List.of("Segments!D3: duplicate cable ID 'C-101S-1' (first on row 2)"),
                problemsAfter(set("Segments", "D3", "C-101S-1")));
    }

    @Test
    void unknownPointTagInSegmentIsRejectedAndBothLegsItTouchesAreReported() throws IOException {
        // moving segment C-101S-2 to an unknown point leaves a hole in P-101 SEND and a stray leg
        assertEquals(List.of(
                        "Segments!A3: unknown point tag 'P-999': not on sheet 'Points'",
                        "Segments!C3: leg P-999 SEND has nothing at positions 1 to 3: number its elements 1, 2, 3"
                                + " ... without gaps",
                        "Joints!C4: leg P-101 SEND has nothing at position 4: number its elements 1, 2, 3 ..."
                                + " without gaps"),
                problemsAfter(set("Segments", "A3", "P-999")));
    }

    @Test
    void misspeltDirectionIsRejected() throws IOException {
        assertEquals(List.of(
                        "Segments!B2: direction must be one of SEND, RETURN, was 'SENT'",
                        "Joints!C3: leg P-101 SEND has nothing at position 2: number its elements 1, 2, 3 ..."
                                + " without gaps"),
                problemsAfter(set("Segments", "B2", "SENT")));
    }

    // --- bends ----------------------------------------------------------------------------

    @Test
    void bendOnUnknownCableIsRejected() throws IOException {
        assertEquals(List.of("Bends!A4: unknown cable ID 'C-999': not on sheet 'Segments'"),
                problemsAfter(set("Bends", "A4", "C-999")));
    }

    @Test
    void fractionalBendCountIsRejected() throws IOException {
        assertEquals(List.of("Bends!C2: bend count must be a whole number from 1 to 10000, was 1.5"),
                problemsAfter(set("Bends", "C2", 1.5)));
    }

    // --- joints ---------------------------------------------------------------------------

    // Connectors mate only within one interface family: IEC 61754 defines each connector family's
    // interface separately (F-SMA in IEC 61754-22, from memory); ConnectorType.matesWith encodes it.
    @Test
    void jointBetweenConnectorsOfDifferentFamiliesIsRejected() throws IOException {
        assertEquals(List.of("Joints!F2: connector type 'FC-PC-MM' (family FC) does not mate with upstream"
                        + " connector type 'SMA905-AIR' (family SMA 905)"),
                problemsAfter(set("Joints", "F2", "FC-PC-MM")));
    }

    @Test
    void unknownConnectorTypeIsRejected() throws IOException {
        assertEquals(List.of("Joints!E2: unknown connector type 'SMA-XYZ': not in the catalog nor on sheet"
                        + " 'Connector types'"),
                problemsAfter(set("Joints", "E2", "SMA-XYZ")));
    }

    @Test
    void unknownPointTagInJointIsRejected() throws IOException {
        List<String> problems = problemsAfter(set("Joints", "A4", "P-999"));
        assertEquals("Joints!A4: unknown point tag 'P-999': not on sheet 'Points'", problems.get(0));
    }

    @Test
    void jointLabelUsedTwiceForOnePointIsRejected() throws IOException {
        assertEquals(List.of("Joints!D3: joint label 'J1' is already used for point P-101 (row 2)"),
                problemsAfter(set("Joints", "D3", "J1")));
    }

    // IEC 61300-3-35 grades end faces; a grade outside the list has no meaning.
    @Test
    void unknownInspectionGradeIsRejected() throws IOException {
        assertEquals(List.of("Joints!G3: inspection grade must be one of NOT_INSPECTED, CLEAN, ACCEPTABLE, DIRTY,"
                        + " DAMAGED, was 'shiny'"),
                problemsAfter(set("Joints", "G3", "shiny")));
    }

    @Test
    void measuredLossBasisWithoutLossIsRejected() throws IOException {
        assertEquals(List.of("Joints!H3: loss basis MEASURED needs the measured loss in dB"),
                problemsAfter(blank("Joints", "H3")));
    }

    @Test
    void jointLabelTurnedIntoDateIsReported() throws IOException {
        assertEquals(List.of("Joints!D2: the cell holds a date: the spreadsheet turned what was typed into a date;"
                        + " format the column as Text and type it again"),
                problemsAfter(wb -> {
                    CellStyle date = wb.createCellStyle();
                    date.setDataFormat(wb.createDataFormat().getFormat("d-mmm"));
                    cell(wb, "Joints", "D2").setCellValue(45293);
                    cell(wb, "Joints", "D2").setCellStyle(date);
                }));
    }

    // --- leg rule -------------------------------------------------------------------------

    @Test
    void positionUsedTwiceInOneLegIsRejected() throws IOException {
        assertEquals(List.of("Joints!C13: position 3 of leg P-101 RETURN is taken already by Joints!C6"),
                problemsAfter(extraJoint(13, "P-101", "RETURN", 3, "J7")));
    }

    @Test
    void gapInPositionsIsRejected() throws IOException {
        assertEquals(List.of("Joints!C4: leg P-101 SEND has nothing at position 5: number its elements 1, 2, 3 ..."
                        + " without gaps"),
                problemsAfter(set("Joints", "C4", 6)));
    }

    @Test
    void legNotStartingAtPositionOneIsRejected() throws IOException {
        assertEquals(List.of("Segments!C8: leg P-102 RETURN has nothing at position 1: number its elements 1, 2, 3"
                        + " ... without gaps"),
                problemsAfter(set("Segments", "C8", 2)));
    }

    @Test
    void twoSegmentsWithoutJointBetweenAreRejected() throws IOException {
        assertEquals(List.of("Segments!C7: two cable segments in a row in leg P-102 SEND (positions 1 and 2):"
                        + " a joint must join them"),
                problemsAfter(set("Segments", "C7", 2).andThen(set("Joints", "C8", 3))));
    }

    @Test
    void twoJointsWithoutSegmentBetweenAreRejected() throws IOException {
        assertEquals(List.of("Joints!C4: two joints in a row in leg P-101 SEND (positions 3 and 4): a cable"
                        + " segment must lie between them"),
                problemsAfter(set("Segments", "C3", 5).andThen(set("Joints", "C4", 4))));
    }

    @Test
    void legOfJointsOnlyIsRejected() throws IOException {
        assertEquals(List.of("Joints!C13: leg P-102 RETURN has no cable segment"),
                problemsAfter(removeRow("Segments", 8).andThen(extraJoint(13, "P-102", "RETURN", 1, "J9"))));
    }

    @Test
    void pointWithoutReturnLegIsRejected() throws IOException {
        assertEquals(List.of("Points!A3: point P-102 has no RETURN leg: enter its cable segments and joints on"
                        + " sheets 'Segments' and 'Joints'"),
                problemsAfter(removeRow("Segments", 8)));
    }

    @Test
    void legStartingWithPigtailSegmentIsAccepted() throws IOException {
        // P-102 SEND starts with a segment (a probe pigtail), P-101 SEND with a joint: both allowed
        ScheduleReadResult result = reader.read(ScheduleFixture.writeEdited(folder, wb -> { }));
        assertTrue(result.isAccepted(), () -> result.problems().toString());
    }

    // --- points and bands -----------------------------------------------------------------

    @Test
    void duplicatePointTagIsRejected() throws IOException {
        List<String> problems = problemsAfter(set("Points", "A3", "P-101"));
        assertEquals("Points!A3: duplicate point tag 'P-101' (first on row 2)", problems.get(0));
        // P-102 now exists nowhere: every row that refers to it says so
        assertTrue(problems.contains("Bands!A4: unknown point tag 'P-102': not on sheet 'Points'"), problems::toString);
    }

    @Test
    void channelBeyondTheAnalyzersChannelsIsRejected() throws IOException {
        assertEquals(List.of("Points!E4: channel 3 exceeds analyzer AN-02's 2 channels"),
                problemsAfter(set("Points", "E4", 3)));
    }

    @Test
    void channelServingTwoPointsIsRejected() throws IOException {
        assertEquals(List.of("Points!E3: channel 1 of analyzer AN-01 already serves point P-101 (row 2)"),
                problemsAfter(set("Points", "E3", 1)));
    }

    @Test
    void fractionalChannelIsRejected() throws IOException {
        assertEquals(List.of("Points!E2: channel must be a whole number from 1 to 1000, was 1.5"),
                problemsAfter(set("Points", "E2", 1.5)));
    }

    @Test
    void unknownAnalyzerIsRejected() throws IOException {
        assertEquals(List.of("Points!D4: unknown analyzer tag 'AN-09': not on sheet 'Analyzers'"),
                problemsAfter(set("Points", "D4", "AN-09")));
    }

    @Test
    void unknownProbeTypeIsRejected() throws IOException {
        assertEquals(List.of("Points!F2: unknown probe type 'TX-UNKNOWN': not in the catalog nor on sheet"
                        + " 'Probe types'"),
                problemsAfter(set("Points", "F2", "TX-UNKNOWN")));
    }

    @Test
    void hazardousAreaMustBeStated() throws IOException {
        assertEquals(List.of("Points!H2: hazardous area is missing: enter YES or NO"),
                problemsAfter(blank("Points", "H2")));
    }

    @Test
    void hazardousAreaOtherThanYesOrNoIsRejected() throws IOException {
        assertEquals(List.of("Points!H2: hazardous area must be YES or NO, was 'maybe'"),
                problemsAfter(set("Points", "H2", "maybe")));
    }

    // Absolute zero, −273.15 °C (SI Brochure, 9th edition, 2019), bounds any temperature.
    @Test
    void processTemperatureBelowAbsoluteZeroIsRejected() throws IOException {
        assertEquals(List.of("Points!J2: process temperature must be at least -273.15 °C, was -300"),
                problemsAfter(set("Points", "J2", -300)));
    }

    @Test
    void pointWithoutBandIsRejected() throws IOException {
        assertEquals(List.of("Points!A3: point P-102 has no band of interest: add at least one row for it on sheet"
                        + " 'Bands'"),
                problemsAfter(removeRow("Bands", 4)));
    }

    @ParameterizedTest(name = "upper edge {0} nm over lower edge 1650 nm")
    @CsvSource({"1650", "1600"})
    void bandWhoseUpperEdgeIsNotAboveItsLowerEdgeIsRejected(double upperNm) throws IOException {
        assertEquals(List.of("Bands!D2: upper edge must be more than the lower edge 1650 nm, was "
                        + DecimalText.display(upperNm)),
                problemsAfter(set("Bands", "D2", upperNm)));
    }

    @Test
    void bandBelowTheAnalyzersRangeIsRejected() throws IOException {
        assertEquals(List.of("Bands!C5: band starts below analyzer AN-02's shortest wavelength 400 nm, was 380"),
                problemsAfter(set("Bands", "C5", 380)));
    }

    // --- analyzers ------------------------------------------------------------------------

    @Test
    void analyzerWithLongestBelowShortestWavelengthIsRejected() throws IOException {
        assertEquals(List.of("Analyzers!D2: longest wavelength must be more than the shortest 1000 nm, was 900"),
                problemsAfter(set("Analyzers", "D2", 900)));
    }

    @Test
    void analyzerTagsDifferingOnlyInCaseAreDuplicates() throws IOException {
        assertEquals(List.of(
                        "Analyzers!A3: duplicate analyzer tag 'an-01' (first on row 2)",
                        "Points!D4: unknown analyzer tag 'AN-02': not on sheet 'Analyzers'"),
                problemsAfter(set("Analyzers", "A3", "an-01")));
    }

    // --- catalog sheets -------------------------------------------------------------------

    // NA = n₀·sin θₐ with θₐ < 90° in air, so 0 < NA < 1 (Keiser, Optical Fiber Communications, from memory).
    @ParameterizedTest(name = "NA {0}")
    @CsvSource({"1.2", "1", "0", "-0.1"})
    void numericalApertureOutsideZeroToOneIsRejected(double na) throws IOException {
        assertEquals(List.of("'Fiber types'!F2: NA must lie between 0 and 1 (both excluded), was "
                        + DecimalText.display(na)),
                problemsAfter(set("Fiber types", "F2", na)));
    }

    @Test
    void claddingSmallerThanCoreIsRejected() throws IOException {
        assertEquals(List.of("'Fiber types'!D2: cladding diameter must be at least the core diameter 300 µm,"
                        + " was 250"),
                problemsAfter(set("Fiber types", "D2", 250)));
    }

    @Test
    void newFiberTypeMayNotReuseAShippedCode() throws IOException {
        // the rows that used the renamed type now refer to a code nobody defines
        assertEquals(List.of(
                        "Segments!E9: unknown fiber type 'SI300-HOH-T': not in the catalog nor on sheet 'Fiber types'",
                        "Segments!E10: unknown fiber type 'SI300-HOH-T': not in the catalog nor on sheet 'Fiber types'",
                        "'Fiber types'!A2: fiber type code 'SI200-LOH' is in the catalog already; give the new fiber"
                                + " type a code of its own",
                        "'Fiber attenuation'!A2: unknown fiber type 'SI300-HOH-T': not on sheet 'Fiber types'",
                        "'Fiber attenuation'!A3: unknown fiber type 'SI300-HOH-T': not on sheet 'Fiber types'",
                        "'Fiber attenuation'!A4: unknown fiber type 'SI300-HOH-T': not on sheet 'Fiber types'"),
                problemsAfter(set("Fiber types", "A2", "SI200-LOH")));
    }

    @Test
    void datasheetPointTwiceAtOneWavelengthIsRejected() throws IOException {
        assertEquals(List.of("'Fiber attenuation'!B3: fiber type SI300-HOH-T already has a datasheet point at"
                        + " 450 nm (row 2)"),
                problemsAfter(set("Fiber attenuation", "B3", 450)));
    }

    @Test
    void connectorTypeWithoutMatingFamilyIsRejected() throws IOException {
        assertEquals(List.of("'Connector types'!C2: mating family is missing"),
                problemsAfter(blank("Connector types", "C2")));
    }

    @Test
    void unknownProbeKindIsRejected() throws IOException {
        assertEquals(List.of("'Probe types'!C2: probe kind must be one of TRANSMISSION, TRANSFLECTANCE,"
                        + " DIFFUSE_REFLECTANCE, ATTENUATED_TOTAL_REFLECTANCE, was 'periscope'"),
                problemsAfter(set("Probe types", "C2", "periscope")));
    }

    @Test
    void listWordsForgiveCaseSpacesAndHyphens() throws IOException {
        ScheduleReadResult result = reader.read(ScheduleFixture.writeEdited(folder,
                set("Fiber types", "H2", "high-OH").andThen(set("Probe types", "C2", "transmission"))
                        .andThen(set("Joints", "G3", "clean "))));
        assertEquals(ScheduleFixture.plant(), assertInstanceOf(ScheduleReadResult.Accepted.class, result).schedule());
    }

    // --- sheets and headers ---------------------------------------------------------------

    @Test
    void missingSheetIsReportedOnceWithoutFollowUpNoise() throws IOException {
        assertEquals(List.of("sheet 'Segments' is missing"),
                problemsAfter(wb -> wb.removeSheetAt(wb.getSheetIndex("Segments"))));
    }

    @Test
    void wrongHeaderIsReportedWithItsCell() throws IOException {
        assertEquals(List.of("Segments!F1: expected header 'Length (m)', was 'Length'"),
                problemsAfter(set("Segments", "F1", "Length")));
    }

    @Test
    void headersForgiveCaseAndSpacing() throws IOException {
        ScheduleReadResult result = reader.read(ScheduleFixture.writeEdited(folder,
                set("Segments", "F1", " length  (M) ")));
        assertTrue(result.isAccepted(), () -> result.problems().toString());
    }

    @Test
    void emptyTemplateSaysThereIsNoPoint() throws IOException {
        Path file = folder.resolve("empty.xlsx");
        try (InputStream in = Templates.open(Templates.CABLE_SCHEDULE)) {
            Files.copy(in, file);
        }
        assertEquals(List.of("sheet 'Points' holds no measurement point; enter at least one from row 2"),
                ScheduleFixture.lines(reader.read(file)));
    }

    // --- all problems at once -------------------------------------------------------------

    @Test
    void everyProblemIsReportedNotJustTheFirst() throws IOException {
        assertEquals(List.of(
                        "Analyzers!F3: allowed loss must be a positive number of dB, was 0",
                        "Points!H2: hazardous area must be YES or NO, was 'maybe'",
                        "Bands!D2: upper edge must be more than the lower edge 1650 nm, was 1600",
                        "Segments!F3: length must be a positive number of metres, was -3",
                        "Joints!F2: connector type 'FC-PC-MM' (family FC) does not mate with upstream connector"
                                + " type 'SMA905-AIR' (family SMA 905)"),
                problemsAfter(set("Segments", "F3", -3).andThen(set("Points", "H2", "maybe"))
                        .andThen(set("Joints", "F2", "FC-PC-MM")).andThen(set("Bands", "D2", 1600))
                        .andThen(set("Analyzers", "F3", 0))));
    }

    @Test
    void problemListIsCappedWithACountOfTheRest() throws IOException {
        List<String> problems = problemsAfter(wb -> {
            for (int r = 20; r < 20 + ProblemLog.LIMIT + 50; r++) {
                cell(wb, "Bends", "A" + r).setCellValue("C-101S-1");
                cell(wb, "Bends", "B" + r).setCellValue(-1);
                cell(wb, "Bends", "C" + r).setCellValue(1);
            }
        });
        assertEquals(ProblemLog.LIMIT + 1, problems.size());
        assertEquals("... and 50 more problems not listed; correct the ones above and import again",
                problems.get(ProblemLog.LIMIT));
    }

    private static Consumer<XSSFWorkbook> extraJoint(int row, String point, String direction, int position,
                                                     String label) {
        return set("Joints", "A" + row, point).andThen(set("Joints", "B" + row, direction))
                .andThen(set("Joints", "C" + row, position)).andThen(set("Joints", "D" + row, label))
                .andThen(set("Joints", "E" + row, "SMA905-AIR"));
    }
}
