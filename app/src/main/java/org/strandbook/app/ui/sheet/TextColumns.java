package org.strandbook.app.ui.sheet;

import java.util.function.Function;

import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.scene.control.TableColumn;

/**
 * Read-only, unsorted text columns of the window's record lists (a point's history, the attention
 * view, an uncertainty budget).
 */
public final class TextColumns {

    private TextColumns() {
    }

    /** A column showing {@code value} of each row, in the lists' own order. */
    public static <T> TableColumn<T, String> of(String id, String title, double width, Function<T, String> value) {
        TableColumn<T, String> c = new TableColumn<>(title);
        c.setId(id);
        c.setPrefWidth(width);
        c.setSortable(false);
        c.setCellValueFactory(f -> new ReadOnlyStringWrapper(value.apply(f.getValue())).getReadOnlyProperty());
        return c;
    }
}
