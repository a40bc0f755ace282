package org.strandbook.app.ui.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.strandbook.app.ui.sheet.CellAddress;
import org.strandbook.app.ui.sheet.CellRange;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;

/** The connector sheet's spread column: a blank shows its default greyed, and is never copied as a value. */
class SpreadColumnsTest {

    private static SheetModel<ConnectorType> sheet() {
        SheetModel<ConnectorType> m = ConnectorSheet.create();
        m.load(List.of(new ConnectorType("SMA-A", "", "SMA 905", 1.0, true)));
        return m;
    }

    @Test
    void aBlankSpreadShowsTheShippedAirGapDefaultAsAHint() {
        // the shipped air-gap range is ±0.5 dB (from memory, BudgetInputUncertainties.SHIPPED)
        SheetModel<ConnectorType> m = sheet();
        int column = m.columnIndex("lossSpread");
        assertEquals("", m.text(new CellAddress(0, column)));
        assertEquals("default ±0.5 dB", m.rows().get(0).cell(column).hint());
        assertEquals("", m.copy(new CellRange(0, column, 0, column)).strip());
    }

    @Test
    void typingTheHintBackClearsTheSpread() {
        // design choice: "default …" pasted from another cell means "no spread of its own"
        SheetModel<ConnectorType> m = sheet();
        CellAddress at = new CellAddress(0, m.columnIndex("lossSpread"));
        m.edit(at, "u 0.1 dB");
        assertEquals(Optional.of(StatedSpread.standardUncertainty(0.1, "dB")),
                m.records().get(0).spreads().of(SpreadInput.CONNECTOR_LOSS));
        m.edit(at, "default ±0.5 dB");
        assertTrue(m.records().get(0).spreads().of(SpreadInput.CONNECTOR_LOSS).isEmpty());
    }
}
