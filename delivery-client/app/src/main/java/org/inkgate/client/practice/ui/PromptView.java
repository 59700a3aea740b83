package org.inkgate.client.practice.ui;

import javafx.scene.AccessibleRole;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import org.inkgate.client.practice.PromptText;

/** A prompt's blocks as wrapped labels: headings, paragraphs and bulleted items. No web view. Also shown in a sitting's task workspace. */
public final class PromptView extends VBox {

    public PromptView() {
        getStyleClass().add("prompt-view");
        setAccessibleRole(AccessibleRole.TEXT);
    }

    public void show(PromptText text) {
        getChildren().clear();
        for (PromptText.Block block : text.blocks()) {
            getChildren().add(switch (block.kind()) {
                case HEADING -> wrapped(block.text(), "prompt-heading");
                case PARAGRAPH -> wrapped(block.text(), "prompt-paragraph");
                case LIST_ITEM -> listItem(block.text());
            });
        }
        setAccessibleText(text.plainText());
    }

    /** A bullet with the item's lines hanging beside it, not under it. */
    private static Node listItem(String text) {
        Label bullet = new Label("\u2022");
        bullet.getStyleClass().add("prompt-bullet");
        bullet.setMinWidth(Region.USE_PREF_SIZE);
        Label item = wrapped(text, "prompt-item");
        HBox.setHgrow(item, Priority.ALWAYS);
        HBox row = new HBox(10, bullet, item);
        row.getStyleClass().add("prompt-item-row");
        return row;
    }

    private static Label wrapped(String text, String styleClass) {
        Label label = new Label(text);
        label.setWrapText(true);
        label.setMinHeight(Region.USE_PREF_SIZE);
        label.getStyleClass().add(styleClass);
        return label;
    }
}
