package org.strandbook.app.ui.catalog;

import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.CellParsers;
import org.strandbook.app.ui.sheet.DecimalParser;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.SpreadInput;
import org.strandbook.uncertainty.BudgetInputUncertainties;

/** The connector-type catalog as a sheet (codes are keys and stay read-only). */
public final class ConnectorSheet {

    private ConnectorSheet() {
    }

    public static SheetModel<ConnectorType> create() {
        return SheetModel.<ConnectorType>builder()
                .column(SheetColumn.derived("code", "Code", false, c -> Figure.text(c.code())))
                .column(SheetColumn.input("description", "Description", ConnectorType::description, v -> v,
                        CellParsers.freeText(), (c, v) -> new ConnectorType(c.code(), v, c.family(), c.typicalLossDb(), c.airGap(), c.spreads())))
                .column(SheetColumn.input("family", "Mating family", ConnectorType::family, v -> v,
                        CellParsers.text("a mating family, e.g. SMA 905"),
                        (c, v) -> new ConnectorType(c.code(), c.description(), v, c.typicalLossDb(), c.airGap(), c.spreads())))
                .column(SheetColumn.number("typical", "Typical loss of a mated pair (dB)", ConnectorType::typicalLossDb, 2,
                        DecimalParser.in("dB").atLeast(0).atMost(20).withDecimalComma(),
                        (c, v) -> new ConnectorType(c.code(), c.description(), c.family(), v, c.airGap(), c.spreads())))
                .column(SheetColumn.input("airGap", "Air gap", ConnectorType::airGap, CellFormats::yesNo, CellParsers.yesNo(),
                        (c, v) -> new ConnectorType(c.code(), c.description(), c.family(), c.typicalLossDb(), v, c.spreads())))
                .column(SpreadColumns.spread("lossSpread", "Loss spread (\u00B1dB or u dB)", SpreadInput.CONNECTOR_LOSS,
                        ConnectorType::spreads, c -> (c.airGap() ? BudgetInputUncertainties.SHIPPED.airGapConnectorPair()
                                : BudgetInputUncertainties.SHIPPED.contactConnectorPair()).inWords(),
                        ConnectorType::withSpreads))
                .column(SpreadColumns.basis(ConnectorType::spreads, ConnectorType::withSpreads))
                .build();
    }
}
