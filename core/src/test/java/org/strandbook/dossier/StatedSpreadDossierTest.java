package org.strandbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.apache.poi.ss.usermodel.Cell;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;
import org.strandbook.store.Workbook;

/** The dossier's Uncertainty sheet names the spread each row used, as the site stated it. */
class StatedSpreadDossierTest {

    @TempDir
    Path dir;

    @Test
    void aConnectorTypesStatedSpreadIsTheBasisOfItsJointsRows() throws IOException {
        // JCGM 100:2008, 4.3.7: ±0.3 dB rectangular gives u(xᵢ) = 0.3/√3 dB
        try (Workbook wb = DossierFixture.create(dir.resolve("site.sqlite"), Map.of())) {
            ConnectorType type = wb.catalog().connectorType("SMA-A").orElseThrow();
            wb.catalog().saveConnectorType(type.withSpreads(new StatedSpreads(Map.of(SpreadInput.CONNECTOR_LOSS,
                    StatedSpread.plusMinus(0.3, "dB")), "datasheet rev C")));
            Path out = dir.resolve("dossier.xlsx");
            DossierWriter.withShippedTemplate().write(DossierFixture.content(wb, DossierScope.everything()), out, false,
                    DossierProgress.NONE);
            try (DossierFile file = new DossierFile(out)) {
                List<Map<String, Cell>> joints = file.rowsOf("Uncertainty", DossierFixture.DIRTY).stream()
                        .filter(r -> DossierFile.string(r, "input").endsWith("connector pair loss")).toList();
                assertTrue(!joints.isEmpty(), "the dirty point has joints");
                for (Map<String, Cell> r : joints) {
                    assertEquals("connector type SMA-A: ±0.3 dB, datasheet rev C (stated)", DossierFile.string(r, "basis"));
                    assertEquals(0.3 / Math.sqrt(3), DossierFile.number(r, "u"), 1e-9);
                }
            }
        }
    }
}
