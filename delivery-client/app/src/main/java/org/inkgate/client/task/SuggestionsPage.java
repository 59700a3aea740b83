package org.inkgate.client.task;

import java.util.List;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.inkgate.packs.policy.Tool;
import org.inkgate.packs.spelling.CheckIssue;

/** The list of flagged words and phrases in the answer, with each one's suggestions on request. */
final class SuggestionsPage implements ToolPage {

    private final Suggestions suggestions;
    private final PanelActions actions;
    private final ListView<CheckIssue> flags = new ListView<>();
    private final Label message = ToolPage.wrapped("", "panel-status");
    private final ListView<String> options = new ListView<>();
    private final Button use = new Button("Use this");
    private final Button ignore = new Button("Ignore this word");
    private final VBox root;
    private CheckIssue open;

    SuggestionsPage(Suggestions suggestions, PanelActions actions, boolean grammar) {
        this.suggestions = suggestions;
        this.actions = actions;
        flags.setId("flagList");
        flags.setAccessibleText(grammar ? "Marked spelling and grammar" : "Marked spellings");
        flags.setPlaceholder(new Label("Nothing is marked."));
        WrappedRows.show(flags, item -> "\u201C" + suggestions.word(item) + "\u201D  "
                + (item.kind() == CheckIssue.Kind.GRAMMAR ? "(grammar)" : "(spelling)"));
        flags.setOnMouseClicked(e -> {
            if (e.getButton() == MouseButton.PRIMARY) {
                showSelected();
            }
        });
        flags.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER) {
                showSelected();
                e.consume();
            }
        });
        message.setId("flagMessage");
        options.setId("suggestionList");
        options.setAccessibleText("Suggestions");
        WrappedRows.show(options, option -> option);
        options.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER) {
                useSelected();
                e.consume();
            }
        });
        use.setId("useSuggestion");
        use.disableProperty().bind(options.getSelectionModel().selectedItemProperty().isNull());
        use.setOnAction(e -> useSelected());
        ignore.setId("ignoreSuggestion");
        ignore.setDisable(true);
        ignore.setOnAction(e -> {
            if (open != null) {
                suggestions.ignore(open);
            }
        });
        Label intro = ToolPage.wrapped(grammar ? "Words and phrases the check marked. Choose one to see suggestions."
                : "Words the spelling check marked. Choose one to see suggestions.", "panel-note");
        // a narrow panel or large print puts the second button under the first rather than shortening both
        use.setMinWidth(Region.USE_PREF_SIZE);
        ignore.setMinWidth(Region.USE_PREF_SIZE);
        root = new VBox(10, intro, flags, message, options, new FlowPane(8, 8, use, ignore));
        root.getStyleClass().add("tool-page");
    }

    /** Shows the current flags (called whenever they change). */
    void update(List<CheckIssue> current) {
        CheckIssue selected = flags.getSelectionModel().getSelectedItem();
        flags.getItems().setAll(current);
        if (selected != null && current.contains(selected)) {
            flags.getSelectionModel().select(selected);
        }
        if (open != null && !current.contains(open)) {
            open = null;
            options.getItems().clear();
            message.setText("");
            ignore.setDisable(true);
        }
    }

    void showSelected() {
        CheckIssue chosen = flags.getSelectionModel().getSelectedItem();
        if (chosen == null || actions.frozen().get()) {
            return;
        }
        open = chosen;
        suggestions.shown(chosen);
        message.setText(chosen.message());
        options.getItems().setAll(chosen.suggestions());
        options.getSelectionModel().selectFirst();
        ignore.setDisable(chosen.kind() != CheckIssue.Kind.SPELLING);
    }

    private void useSelected() {
        String s = options.getSelectionModel().getSelectedItem();
        if (open != null && s != null) {
            suggestions.accept(open, s);
        }
    }

    @Override
    public Tool tool() {
        return Tool.SPELLING;
    }

    @Override
    public String title() {
        return "_Spelling";
    }

    @Override
    public Node content() {
        return root;
    }

    @Override
    public void focusStart() {
        flags.requestFocus();
        if (flags.getSelectionModel().isEmpty()) {
            flags.getSelectionModel().selectFirst();
        }
    }
}
