package org.inkgate.client.sitting.ui.screen;

import java.util.List;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Region;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.parts.Parts;

/**
 * Review and confirm before final submission (WCAG 3.3.4 Error Prevention: the candidate sees
 * what will be handed in and confirms it before it is sent).
 */
public final class ReviewScreen {

    /** One task as handed in: its title, words written and the word guidance, if any. */
    public record Row(String title, int words, String guidance) {
    }

    private final CheckBox sure = new CheckBox("I have _finished and want to hand in my answers");
    private final Button submit;
    private final Parent root;

    public ReviewScreen(List<Row> rows, Runnable onSubmit) {
        VBox table = new VBox();
        table.setId("reviewRows");
        int n = 1;
        for (Row row : rows) {
            Label title = new Label(n++ + ". " + row.title());
            title.setWrapText(true);
            title.setMaxWidth(Double.MAX_VALUE);
            HBox.setHgrow(title, Priority.ALWAYS);
            Label words = new Label(row.words() + (row.words() == 1 ? " word" : " words"));
            words.getStyleClass().add("review-words");
            words.setMinWidth(Region.USE_PREF_SIZE);
            Label guidance = new Label(row.guidance() == null ? "" : row.guidance());
            guidance.getStyleClass().add("quiet-note");
            guidance.setMinWidth(Region.USE_PREF_SIZE);
            HBox line = new HBox(title, words, guidance);
            line.getStyleClass().add("review-row");
            line.setAccessibleText(row.title() + ": " + words.getText() + ". " + guidance.getText());
            table.getChildren().add(line);
        }
        sure.setId("confirmCheck");
        sure.setMnemonicParsing(true);
        submit = Parts.primary("submitButton", "_Hand in my answers", onSubmit);
        submit.disableProperty().bind(sure.selectedProperty().not());
        VBox box = new VBox(14,
                Parts.heading("Check before you hand in"),
                Parts.text("Your tasks are finished. This is what will be handed in. After you hand in,"
                        + " nothing can be changed."),
                table);
        root = Parts.cardWithActions("reviewScreen", new VBox(10, sure, submit), box);
    }

    public Parent root() {
        return root;
    }

    public void focus() {
        sure.requestFocus();
    }
}
