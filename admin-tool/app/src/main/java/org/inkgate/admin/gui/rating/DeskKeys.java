package org.inkgate.admin.gui.rating;

import java.util.function.Supplier;
import javafx.scene.Node;
import javafx.scene.control.ButtonBase;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;

/** Keyboard rules the desk's views share. */
final class DeskKeys {

    private DeskKeys() {
    }

    /** Enter fires a focused button as Space does (JavaFX fires only on Space unless the button is the default). */
    static void enterFires(ButtonBase button) {
        button.addEventHandler(KeyEvent.KEY_PRESSED, e -> {
            if (e.getCode() == KeyCode.ENTER && !e.isShortcutDown() && !e.isAltDown()) {
                button.fire();
                e.consume();
            }
        });
    }

    /**
     * Tab and Shift+Tab leave a text area (which would otherwise type a tab or keep focus) for
     * the given neighbours, so the rater never gets stuck in a box.
     */
    static void tabLeaves(Node area, Supplier<Node> next, Supplier<Node> previous) {
        area.addEventFilter(KeyEvent.KEY_PRESSED, e -> {
            if (e.getCode() == KeyCode.TAB && !e.isShortcutDown() && !e.isAltDown()) {
                Node target = (e.isShiftDown() ? previous : next).get();
                if (target != null) {
                    target.requestFocus();
                }
                e.consume();
            }
        });
    }

    /**
     * Gives {@code node} focus now, or as soon as it is in the scene: a node inside a scroll pane
     * joins the scene only when the pane's skin is made, on the next layout pulse.
     */
    static void focusWhenShown(Node node) {
        if (node.getScene() != null) {
            node.requestFocus();
            return;
        }
        node.sceneProperty().addListener(new javafx.beans.value.ChangeListener<>() {
            @Override
            public void changed(javafx.beans.value.ObservableValue<? extends javafx.scene.Scene> o, javafx.scene.Scene was,
                    javafx.scene.Scene now) {
                if (now != null) {
                    node.sceneProperty().removeListener(this);
                    javafx.application.Platform.runLater(node::requestFocus);
                }
            }
        });
    }
}
