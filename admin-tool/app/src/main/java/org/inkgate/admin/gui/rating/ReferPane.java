package org.inkgate.admin.gui.rating;

import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.control.TitledPane;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.inkgate.admin.core.rating.Referrals;

/**
 * The desk's "refer" action, folded away under the rubric: a reason, a note and a button that
 * hands the open script to the test owner (identity revealed, suspected unallowed help, off task).
 */
final class ReferPane {

    private ReferPane() {
    }

    static TitledPane of(DeskModel model) {
        // a ChoiceBox, not a ComboBox: no hidden list without an accessible name
        ChoiceBox<Referrals.Reason> reason = new ChoiceBox<>();
        reason.setId("referReason");
        reason.getItems().setAll(Referrals.Reason.values());
        reason.setAccessibleText("Reason for referring this script");
        reason.setConverter(new StringConverter<>() {
            @Override
            public String toString(Referrals.Reason r) {
                return r == null ? "Choose a reason" : r.meaning();
            }

            @Override
            public Referrals.Reason fromString(String s) {
                throw new UnsupportedOperationException("the reasons are chosen, never typed");
            }
        });
        reason.valueProperty().bindBidirectional(model.referReason());
        Label reasonLabel = new Label("Reason");
        reasonLabel.getStyleClass().add("field-label");
        reasonLabel.setLabelFor(reason);

        TextArea note = new TextArea();
        note.setId("referNote");
        note.setWrapText(true);
        note.setPrefRowCount(3);
        note.setAccessibleText("What you saw (sent to the test owner)");
        note.textProperty().bindBidirectional(model.referNote());
        Label noteLabel = new Label("What you saw");
        noteLabel.getStyleClass().add("field-label");
        noteLabel.setLabelFor(note);

        Button send = new Button("Refer to the test owner");
        send.setId("sendReferral");
        send.setOnAction(e -> model.refer());
        send.disableProperty().bind(model.current().isNull());
        Label how = new Label("The test owner decides what follows under their regulations; the script stays in"
                + " your queue.");
        how.setWrapText(true);
        how.getStyleClass().add("desk-note");

        TitledPane pane = new TitledPane("Refer this script to the test owner",
                new VBox(8, how, reasonLabel, reason, noteLabel, note, send));
        pane.setId("referPane");
        pane.setExpanded(false);
        pane.setAccessibleText("Refer this script to the test owner");
        return pane;
    }
}
