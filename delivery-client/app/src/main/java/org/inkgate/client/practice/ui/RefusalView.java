package org.inkgate.client.practice.ui;

import javafx.geometry.Pos;
import javafx.scene.AccessibleRole;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;

/** Shown instead of the exam when a bundle is refused: the reason and nothing from the bundle. */
public final class RefusalView extends VBox {

    static final String HEADING = "This exam bundle was not opened";
    static final String ADVICE = "Nothing from this bundle is shown. Follow the advice above, or ask the person"
            + " who gave you the file for a new copy.";

    private final Button close = new Button("_Close");

    public RefusalView(String message, Runnable onClose) {
        getStyleClass().add("refusal-view");
        setAlignment(Pos.TOP_LEFT);
        Label heading = new Label(HEADING);
        heading.getStyleClass().add("refusal-heading");
        heading.setAccessibleRole(AccessibleRole.TEXT);
        Label reason = new Label(message);
        reason.setId("refusalMessage");
        reason.getStyleClass().add("refusal-message");
        reason.setWrapText(true);
        reason.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        Label advice = new Label(ADVICE);
        advice.getStyleClass().add("quiet-note");
        advice.setWrapText(true);
        close.setId("closeButton");
        close.setMnemonicParsing(true);
        close.setDefaultButton(true);
        close.setOnAction(event -> onClose.run());
        VBox card = new VBox(16, heading, reason, advice, close);
        card.getStyleClass().add("refusal-card");
        card.setMaxWidth(760);
        setAccessibleText(HEADING + ". " + message);
        getChildren().add(card);
    }

    public Button closeButton() {
        return close;
    }
}
