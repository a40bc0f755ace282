package org.strandbook.templates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.PaneInformation;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Opens every shipped template and catalog and checks its sheets and headers against the layout
 * written out here, independently of the code in core that reads and writes them: a changed header
 * must be changed in both places on purpose.
 */
class TemplatesTest {

    private static final Map<String, List<String>> SCHEDULE_SHEETS = new LinkedHashMap<>();

    static {
        SCHEDULE_SHEETS.put("Analyzers", List.of("Analyzer tag", "Description", "Shortest wavelength (nm)",
                "Longest wavelength (nm)", "Channels (count)", "Allowed loss (dB)", "Detector (list)"));
        SCHEDULE_SHEETS.put("Points", List.of("Point tag", "Service", "Location", "Analyzer tag", "Channel (no.)",
                "Probe type code", "Tolerance (dB)", "Hazardous area (YES/NO)", "Hydrogen service (YES/NO)",
                "Process temperature (°C)"));
        SCHEDULE_SHEETS.put("Bands", List.of("Point tag", "Band name", "From (nm)", "To (nm)"));
        SCHEDULE_SHEETS.put("Segments", List.of("Point tag", "Direction (SEND/RETURN)", "Position (no.)", "Cable ID",
                "Fiber type code", "Length (m)", "Length tolerance (±m or ±%)", "Bend radius spread (±mm or ±%)",
                "Spread basis"));
        SCHEDULE_SHEETS.put("Bends", List.of("Cable ID", "Bend radius (mm)", "Bends (count)"));
        SCHEDULE_SHEETS.put("Joints", List.of("Point tag", "Direction (SEND/RETURN)", "Position (no.)", "Joint label",
                "Upstream connector (code)", "Downstream connector (code)", "Inspection grade (list)", "Loss (dB)",
                "Loss basis (ASSUMED/MEASURED)", "Loss spread (±dB or u dB)", "Spread basis"));
        SCHEDULE_SHEETS.put("Fiber types", List.of("Fiber type code", "Description", "Core (µm)", "Cladding (µm)",
                "Buffer (µm)", "NA (0 to 1)", "Core material", "OH grade (list)", "OH content (ppm)",
                "OH spread (ppm range or ±%)", "Attenuation spread (±%)", "Spread basis"));
        SCHEDULE_SHEETS.put("Fiber attenuation", List.of("Fiber type code", "Wavelength (nm)", "Attenuation (dB/km)"));
        SCHEDULE_SHEETS.put("Connector types", List.of("Connector type code", "Description", "Mating family",
                "Typical loss (dB)", "Air gap (YES/NO)", "Loss spread (±dB or u dB)", "Spread basis"));
        SCHEDULE_SHEETS.put("Probe types", List.of("Probe type code", "Description", "Probe kind (list)",
                "Window material", "Window faces (count)", "Optical path (mm)", "Fixed loss (dB)",
                "Fixed loss spread (±dB or ±%)", "Spread basis"));
    }

    @Test
    void everyXlsxTemplateOpens() throws IOException {
        for (String name : Templates.XLSX_TEMPLATES) {
            try (InputStream in = Templates.open(name); XSSFWorkbook wb = new XSSFWorkbook(in)) {
                assertTrue(wb.getNumberOfSheets() > 0, name);
            }
        }
    }

    @Test
    void cableScheduleHasItsSheetsInOrderWithFrozenHeaders() throws IOException {
        try (InputStream in = Templates.open(Templates.CABLE_SCHEDULE); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            List<String> names = new ArrayList<>();
            wb.forEach(s -> names.add(s.getSheetName()));
            List<String> expected = new ArrayList<>(List.of("Read me"));
            expected.addAll(SCHEDULE_SHEETS.keySet());
            assertEquals(expected, names);
            for (Map.Entry<String, List<String>> sheet : SCHEDULE_SHEETS.entrySet()) {
                Sheet s = wb.getSheet(sheet.getKey());
                assertEquals(sheet.getValue(), headers(s.getRow(0)), sheet.getKey());
                assertEquals(1, s.getPhysicalNumberOfRows(), sheet.getKey() + " holds nothing but its header");
                PaneInformation pane = s.getPaneInformation();
                assertTrue(pane != null && pane.isFreezePane(), sheet.getKey() + " freezes its header row");
            }
        }
    }

    static List<String[]> catalogs() {
        return List.of(
                new String[] {Templates.FIBER_TYPES, "Fiber types"},
                new String[] {Templates.CONNECTOR_TYPES, "Connector types"},
                new String[] {Templates.PROBE_TYPES, "Probe types"});
    }

    // Each shipped figure is marked by where it comes from: "common practice" (a rule of thumb of
    // the trade) or "from memory" (recalled without a source), so a user knows to check it.
    @ParameterizedTest(name = "{0}")
    @MethodSource("catalogs")
    void catalogHasTheSheetsHeadersAndMarksTheBasisOfEveryRow(String resource, String sheet) throws IOException {
        List<String> expectedHeader = new ArrayList<>(SCHEDULE_SHEETS.get(sheet));
        expectedHeader.add("Basis");
        List<String[]> rows = new ArrayList<>();
        try (BufferedReader in = new BufferedReader(new InputStreamReader(Templates.open(resource),
                StandardCharsets.UTF_8))) {
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    rows.add(line.split(",", -1));
                }
            }
        }
        assertEquals(expectedHeader, List.of(rows.get(0)));
        assertTrue(rows.size() > 1, resource + " lists at least one type");
        for (String[] row : rows.subList(1, rows.size())) {
            assertEquals(expectedHeader.size(), row.length, () -> resource + ": " + String.join(",", row));
            String basis = row[row.length - 1];
            assertTrue(basis.equals("common practice") || basis.startsWith("from memory"), basis);
            assertFalse(row[0].isBlank(), () -> resource + ": a row without a type code");
        }
    }

    private static List<String> headers(Row row) {
        List<String> headers = new ArrayList<>();
        for (Cell cell : row) {
            headers.add(cell.getStringCellValue());
        }
        return headers;
    }
}
