package org.inkgate.client.task;

import java.util.ArrayList;
import java.util.List;
import javafx.scene.Node;
import javafx.scene.Parent;

/**
 * Moves focus out of the answer to the next (or previous) focusable control, in scene order.
 * The answer editor keeps Tab for itself, as a text area does, so Ctrl+Tab must leave it or a
 * keyboard user would be trapped (WCAG 2.1.2).
 */
final class FocusWalk {

    private FocusWalk() {
    }

    /** Focuses the control after (or before) {@code from}; returns false when there is none. */
    static boolean move(Node from, boolean backwards) {
        if (from.getScene() == null) {
            return false;
        }
        List<Node> order = new ArrayList<>();
        collect(from.getScene().getRoot(), from, order);
        int at = order.indexOf(from);
        if (order.size() < 2 || at < 0) {
            return false;
        }
        int next = Math.floorMod(at + (backwards ? -1 : 1), order.size());
        order.get(next).requestFocus();
        return true;
    }

    private static void collect(Node n, Node from, List<Node> out) {
        if (!n.isVisible() || n.isDisabled()) {
            return;
        }
        if (n == from || n.isFocusTraversable()) {
            out.add(n);
            if (n == from) {
                return; // the answer's own parts are not stops
            }
        }
        if (n instanceof Parent p) {
            for (Node c : p.getChildrenUnmodifiable()) {
                collect(c, from, out);
            }
        }
    }
}
