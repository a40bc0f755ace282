package org.strandbook.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;
import org.strandbook.store.Workbook;

/** A spread stated on a catalog row is the one `evaluate --json` reports, with the words of its basis. */
class StatedSpreadCommandTest {

    @TempDir
    Path dir;

    @Test
    void theBudgetRowNamesTheConnectorTypeAndItsBasis() {
        // JCGM 100:2008, 4.3.7: ±0.3 dB rectangular gives u = 0.3/√3 = 0.1732 dB
        Path file = DemoWorkbook.create(dir.resolve("saltmarsh.sqlite"), List.of("AT-4101"), 2);
        try (Workbook wb = Workbook.open(file, "r.inglenook")) {
            ConnectorType type = wb.catalog().connectorType("SMA-A").orElseThrow();
            wb.catalog().saveConnectorType(type.withSpreads(new StatedSpreads(Map.of(SpreadInput.CONNECTOR_LOSS,
                    StatedSpread.plusMinus(0.3, "dB")), "datasheet rev C")));
        }
        CliRun json = CliRun.of("evaluate", file.toString(), "--json");
        assertEquals(0, json.exitCode(), json.err());
        assertTrue(json.out().contains("\"basis\":\"STATED\",\"basis_text\":\"connector type SMA-A: ±0.3 dB, datasheet"
                + " rev C\",\"standard_uncertainty\":0.1732"), json.out());
    }
}
