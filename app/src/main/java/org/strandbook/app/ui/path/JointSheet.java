package org.strandbook.app.ui.path;

import java.util.Collection;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Function;
import java.util.function.Supplier;

import org.strandbook.app.ui.sheet.CellFormats;
import org.strandbook.app.ui.sheet.CellParsers;
import org.strandbook.app.ui.sheet.DecimalParser;
import org.strandbook.app.ui.sheet.Figure;
import org.strandbook.app.ui.sheet.RowFigures;
import org.strandbook.app.ui.sheet.SheetColumn;
import org.strandbook.app.ui.sheet.SheetModel;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.SpreadInput;
import org.strandbook.uncertainty.BudgetInputUncertainties;
import org.strandbook.app.ui.catalog.SpreadColumns;

/**
 * The "Joints" sheet of one point: both legs, each joint with the elements it connects and the
 * loss it contributes to the predicted loop at the first band's centre.
 */
public final class JointSheet {

    public static final String BETWEEN = "between";
    public static final String LOSS = "lossDb";

    private JointSheet() {
    }

    /**
     * @param connectorCodes the connector catalog's codes, read at each parse
     * @param figures        the computed columns {@link #BETWEEN} and {@link #LOSS} for all rows
     */
    public static SheetModel<LegJoint> create(Supplier<? extends Collection<String>> connectorCodes,
                                              Function<List<LegJoint>, List<RowFigures>> figures) {
        return SheetModel.<LegJoint>builder()
                .column(SheetColumn.derived("leg", "Leg", false, j -> Figure.text(CellFormats.choice(j.direction()))))
                .column(SheetColumn.input("label", "Joint", (LegJoint j) -> j.joint().label(), v -> v,
                        CellParsers.text("a joint label"), (j, v) -> with(j, v, j.joint().connectorTypeA(),
                                j.joint().connectorTypeB(), j.joint().grade(), j.joint().lossDb(), j.joint().lossBasis())))
                .column(SheetColumn.computed(BETWEEN, "Between", false))
                .column(SheetColumn.input("connectorA", "Connector (light in)", (LegJoint j) -> j.joint().connectorTypeA(), v -> v,
                        CellParsers.catalogCode("connector catalog", connectorCodes),
                        (j, v) -> with(j, j.joint().label(), v, j.joint().connectorTypeB(), j.joint().grade(),
                                j.joint().lossDb(), j.joint().lossBasis())))
                .column(SheetColumn.input("connectorB", "Connector (light out)", (LegJoint j) -> j.joint().connectorTypeB(), v -> v,
                        CellParsers.catalogCode("connector catalog", connectorCodes),
                        (j, v) -> with(j, j.joint().label(), j.joint().connectorTypeA(), v, j.joint().grade(),
                                j.joint().lossDb(), j.joint().lossBasis())))
                .column(SheetColumn.input("grade", "End face", (LegJoint j) -> j.joint().grade(), CellFormats::choice,
                        CellParsers.choice(InspectionGrade.class),
                        (j, v) -> with(j, j.joint().label(), j.joint().connectorTypeA(), j.joint().connectorTypeB(), v,
                                j.joint().lossDb(), j.joint().lossBasis())))
                .column(SheetColumn.input("loss", "Entered loss (dB)", (LegJoint j) -> j.joint().lossDb(),
                        CellFormats.optionalDecimal(2),
                        CellParsers.optional(DecimalParser.in("dB").atLeast(0).atMost(20).withDecimalComma()),
                        (j, v) -> with(j, j.joint().label(), j.joint().connectorTypeA(), j.joint().connectorTypeB(),
                                j.joint().grade(), v, j.joint().lossBasis())))
                .column(SheetColumn.input("basis", "Loss basis", (LegJoint j) -> j.joint().lossBasis(), CellFormats::choice,
                        CellParsers.choice(LossBasis.class),
                        (j, v) -> with(j, j.joint().label(), j.joint().connectorTypeA(), j.joint().connectorTypeB(),
                                j.joint().grade(), j.joint().lossDb(), v)))
                .column(SheetColumn.computed(LOSS, "Loss at 1st band centre (dB)", true))
                .column(SpreadColumns.spread("lossSpread", "Loss spread (\u00B1dB or u dB)", SpreadInput.JOINT_LOSS,
                        (LegJoint j) -> j.joint().spreads(), j -> j.joint().lossBasis() == LossBasis.MEASURED
                                ? BudgetInputUncertainties.SHIPPED.measuredJoint().inWords() : "from its connector type",
                        (j, v) -> j.with(j.joint().withSpreads(v))))
                .column(SpreadColumns.basis((LegJoint j) -> j.joint().spreads(), (j, v) -> j.with(j.joint().withSpreads(v))))
                .uniqueKey("label", j -> j.direction() + "/" + j.joint().label())
                .newRowsFrom((above, all) -> new LegJoint(above.direction(),
                        LegRows.placeAfter(above.position(), all.stream().filter(j -> j.direction() == above.direction())
                                .map(LegJoint::position).toList()),
                        new Joint(LabelSequence.nextUnused(above.joint().label(), all.stream()
                                .filter(j -> j.direction() == above.direction()).map(j -> j.joint().label()).toList()),
                                above.joint().connectorTypeA(), above.joint().connectorTypeB(), InspectionGrade.NOT_INSPECTED,
                                OptionalDouble.empty(), LossBasis.ASSUMED)))
                .evaluator(figures)
                .build();
    }

    private static LegJoint with(LegJoint j, String label, String a, String b, InspectionGrade grade,
                                 OptionalDouble lossDb, LossBasis basis) {
        return j.with(new Joint(label, a, b, grade, lossDb, basis, j.joint().spreads()));
    }
}
