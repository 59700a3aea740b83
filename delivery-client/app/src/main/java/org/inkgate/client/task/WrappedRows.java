package org.inkgate.client.task;

import java.util.function.Function;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;

/**
 * Rows of a panel list that wrap at the list's width instead of running past its side: a glossary
 * hit with its equivalents, or a dictionary entry in large print, is longer than the panel is wide,
 * and a row read by scrolling sideways is a row half read.
 */
final class WrappedRows {

    private WrappedRows() {
    }

    /** Gives the list rows showing {@code text} of each item, wrapped at the list's width. */
    static <T> void show(ListView<T> list, Function<T, String> text) {
        list.setCellFactory(view -> new ListCell<>() {
            {
                setWrapText(true);
                // no width of its own: the list gives every row its visible width, and the text wraps there
                setPrefWidth(0);
            }

            @Override
            protected void updateItem(T item, boolean empty) {
                super.updateItem(item, empty);
                setText(empty || item == null ? null : text.apply(item));
            }
        });
    }
}
