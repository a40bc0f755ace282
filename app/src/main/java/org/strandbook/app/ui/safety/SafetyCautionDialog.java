package org.strandbook.app.ui.safety;

import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Label;
import javafx.stage.Window;

/** Shows {@link SafetyCaution#TEXT}; the user must acknowledge it before the action goes on. */
public final class SafetyCautionDialog {

    private static final ButtonType PROCEED = new ButtonType("I have read this \u2013 proceed", ButtonBar.ButtonData.OK_DONE);

    private SafetyCautionDialog() {
    }

    /**
     * Asks once per session before an action: true when the user proceeds (or already did this
     * session), false when they stop.
     */
    public static boolean confirmOnce(Window owner, SafetyCaution caution, String reason) {
        if (!caution.needed()) {
            return true;
        }
        Alert alert = new Alert(Alert.AlertType.WARNING, "", PROCEED, ButtonType.CANCEL);
        alert.initOwner(owner);
        alert.setTitle(SafetyCaution.TITLE);
        alert.setHeaderText(reason);
        alert.getDialogPane().setContent(body());
        boolean proceed = alert.showAndWait().filter(b -> b == PROCEED).isPresent();
        if (proceed) {
            caution.acknowledge();
        }
        return proceed;
    }

    /** The caution for reading, from the Help menu. */
    public static void show(Window owner) {
        Alert alert = new Alert(Alert.AlertType.INFORMATION, "", ButtonType.CLOSE);
        alert.initOwner(owner);
        alert.setTitle(SafetyCaution.TITLE);
        alert.setHeaderText("Before working on a light path");
        alert.getDialogPane().setContent(body());
        alert.showAndWait();
    }

    private static Label body() {
        Label text = new Label(SafetyCaution.TEXT);
        text.setWrapText(true);
        text.setPrefWidth(560);
        text.setId("safety-caution-text");
        return text;
    }
}
