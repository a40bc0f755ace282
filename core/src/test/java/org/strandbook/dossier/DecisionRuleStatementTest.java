package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

import org.junit.jupiter.api.Test;
import org.strandbook.site.DecisionRule;

/**
 * The dossier states the decision rule in force in the terms of the documents that define them:
 * ILAC-G8:09/2019 (simple acceptance, w = 0; decision rules with a guard band) and JCGM 106:2012,
 * clause 8 (acceptance zone, guard band, rejection zone).
 */
class DecisionRuleStatementTest {

    @Test
    void theFixedToleranceIsNamedASimpleAcceptanceRule() {
        String text = DossierText.decisionRule(DecisionRule.FIXED, 1.0);
        for (String must : List.of("simple acceptance", "ILAC-G8:09/2019", "w = 0", "not taken into account",
                "1.00 dB")) {
            assertTrue(text.contains(must), must + " in: " + text);
        }
    }

    @Test
    void theCoverageIntervalNamesItsZonesGuardBandAndCoverage() {
        String text = DossierText.decisionRule(new DecisionRule(DecisionRule.Kind.COVERAGE_INTERVAL, 0.99, 0.3), 1.0);
        for (String must : List.of("ILAC-G8:09/2019", "JCGM 106:2012", "acceptance zone", "guard band w = 0.30 dB",
                "rejection zone", "99 % coverage interval", "JCGM 101:2008", "expanded uncertainty", "20 nm")) {
            assertTrue(text.contains(must), must + " in: " + text);
        }
    }

    @Test
    void theMethodSheetRowGrowsToShowTheWholeRule() throws Exception {
        // design choice: a filled paragraph longer than its cell is wide gets the lines it needs
        try (XSSFWorkbook wb = DossierTemplateBuilder.build()) {
            Map<Placeholder, String> values = new EnumMap<>(Placeholder.class);
            for (Placeholder p : Placeholder.values()) {
                values.put(p, "x");
            }
            values.put(Placeholder.DECISION_RULE, DossierText.decisionRule(DecisionRule.interval(), 1.0));
            DossierStyles styles = new DossierStyles(wb);
            Placeholders.fill(wb, values, styles);
            for (Row row : wb.getSheet(DossierSheet.CAUTIONS.title())) {
                for (Cell cell : row) {
                    if (cell.toString().startsWith("The rules above are those of the fixed tolerance")) {
                        float oneLine = styles.lineHeightPoints(cell.getCellStyle());
                        assertTrue(row.getHeightInPoints() >= 5 * oneLine, "row height " + row.getHeightInPoints());
                        return;
                    }
                }
            }
            throw new AssertionError("no decision-rule paragraph on the method sheet");
        }
    }
}
