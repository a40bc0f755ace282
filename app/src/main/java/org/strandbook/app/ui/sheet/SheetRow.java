package org.strandbook.app.ui.sheet;

import java.util.ArrayList;
import java.util.List;

import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;

/**
 * One row as the view binds to it. The row object stays the same while its record and cell
 * contents change, so the table keeps its selection and focus across edits.
 */
public final class SheetRow<R> {

    private final ReadOnlyObjectWrapper<R> record;
    private final List<ReadOnlyObjectWrapper<CellContent>> cells;

    SheetRow(R record, int columns) {
        this.record = new ReadOnlyObjectWrapper<>(this, "record", record);
        this.cells = new ArrayList<>(columns);
        for (int c = 0; c < columns; c++) {
            cells.add(new ReadOnlyObjectWrapper<>(this, "cell" + c, new CellContent("", null, "")));
        }
    }

    public R record() {
        return record.get();
    }

    public ReadOnlyObjectProperty<R> recordProperty() {
        return record.getReadOnlyProperty();
    }

    public CellContent cell(int column) {
        return cells.get(column).get();
    }

    public ReadOnlyObjectProperty<CellContent> cellProperty(int column) {
        return cells.get(column).getReadOnlyProperty();
    }

    void setRecord(R r) {
        record.set(r);
    }

    void setCell(int column, CellContent content) {
        ReadOnlyObjectWrapper<CellContent> cell = cells.get(column);
        if (!content.equals(cell.get())) {
            cell.set(content);
        }
    }
}
