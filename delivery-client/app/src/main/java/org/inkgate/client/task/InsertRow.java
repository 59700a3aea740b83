package org.inkgate.client.task;

import java.util.Collection;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.VBox;
import org.inkgate.packs.policy.Tool;

/**
 * The part of a lookup page that inserts a word or term of the open entry into the answer. A page
 * shows its {@link #node()} only when the policy allows insertion from the panel.
 */
final class InsertRow {

    private final Tool tool;
    private final PanelActions actions;
    private final ListView<String> choices = new ListView<>();
    private final VBox box;
    private String entryId;

    /**
     * @param idPrefix node ids are {@code idPrefix + "Insertable"} and {@code idPrefix + "Insert"}
     * @param noun     what is inserted, singular ("word", "term")
     */
    InsertRow(Tool tool, PanelActions actions, String idPrefix, String noun) {
        this.tool = tool;
        this.actions = actions;
        choices.setId(idPrefix + "Insertable");
        choices.setAccessibleText(Character.toUpperCase(noun.charAt(0)) + noun.substring(1) + "s from this entry you may insert");
        WrappedRows.show(choices, chosen -> chosen);
        Button insert = new Button("Insert into answer");
        insert.setId(idPrefix + "Insert");
        insert.disableProperty().bind(choices.getSelectionModel().selectedItemProperty().isNull());
        insert.setOnAction(e -> insertSelected());
        choices.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER) {
                insertSelected();
                e.consume();
            }
        });
        box = new VBox(6, ToolPage.wrapped("Insert a " + noun + " from this entry at the cursor:", "panel-note"), choices, insert);
        box.getStyleClass().add("insert-box");
    }

    Node node() {
        return box;
    }

    /** Offers the open entry's words or terms. */
    void show(String openEntryId, Collection<String> items) {
        entryId = openEntryId;
        choices.getItems().setAll(items);
    }

    /** No entry is open. */
    void clear() {
        entryId = null;
        choices.getItems().clear();
    }

    private void insertSelected() {
        String chosen = choices.getSelectionModel().getSelectedItem();
        if (chosen != null && entryId != null) {
            actions.insert(tool, entryId, chosen);
        }
    }
}
