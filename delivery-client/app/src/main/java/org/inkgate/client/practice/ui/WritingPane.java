package org.inkgate.client.practice.ui;

import javafx.geometry.Pos;
import javafx.scene.AccessibleRole;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/** A plain writing area for practice, with the live word count and the word guidance. */
final class WritingPane extends VBox {

    private final TextArea editor = new TextArea();

    WritingPane(PracticeViewModel vm) {
        getStyleClass().add("writing-pane");
        Label heading = new Label("_Your practice writing");
        heading.setMnemonicParsing(true);
        heading.setLabelFor(editor);
        heading.getStyleClass().add("pane-heading");
        Label note = new Label("Kept for each task while this window is open; never saved or sent."
                + " Ctrl+Tab moves out of the writing area.");
        note.getStyleClass().add("quiet-note");
        note.setWrapText(true);
        note.setMinHeight(Region.USE_PREF_SIZE);

        editor.setId("editor");
        editor.setWrapText(true);
        editor.setPromptText("Start writing here.");
        editor.textProperty().bindBidirectional(vm.draftProperty());
        editor.setAccessibleRole(AccessibleRole.TEXT_AREA);
        editor.accessibleTextProperty().bind(vm.editorDescriptionProperty());
        VBox.setVgrow(editor, Priority.ALWAYS);

        getChildren().addAll(heading, note, editor, status(vm));
    }

    TextArea editor() {
        return editor;
    }

    private static HBox status(PracticeViewModel vm) {
        Label count = new Label();
        count.setId("wordCount");
        count.getStyleClass().add("word-count");
        count.textProperty().bind(vm.wordCountTextProperty());
        count.setAccessibleRole(AccessibleRole.TEXT);
        count.accessibleTextProperty().bind(count.textProperty());
        Label guidance = new Label();
        guidance.setId("wordGuidance");
        guidance.getStyleClass().add("word-guidance");
        guidance.textProperty().bind(vm.guidanceTextProperty());
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox status = new HBox(16, count, gap, guidance);
        status.getStyleClass().add("writing-status");
        status.setAlignment(Pos.CENTER_LEFT);
        return status;
    }
}
