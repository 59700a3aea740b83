package org.inkgate.client.sitting.ui;

import java.util.ArrayList;
import java.util.List;
import javafx.event.Event;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;

/**
 * Keeps the keys a candidate types between asking for a task ("Begin", "Yes, finish this task")
 * and the new task's editor taking focus, and hands them to the editor in order, so the first
 * words typed are never lost while the task screen is prepared and laid out (issue 13: seen lost
 * in large print, where layout takes longer). Only writing keys are kept: characters, Backspace,
 * Delete, Enter; shortcuts pass untouched, so the invigilator's keys always work. Keys are never
 * kept across a task ending for time or by the invigilator: what is typed then belongs to no task.
 */
final class TypeAhead {

    private final Scene scene;
    private final List<KeyEvent> held = new ArrayList<>();
    private boolean holding;
    /** Where the editor the keys are for lives, once it is on screen. */
    private Node awaited;

    TypeAhead(Scene scene) {
        this.scene = scene;
        scene.addEventFilter(KeyEvent.ANY, this::filter);
    }

    /** From now on, writing keys are kept for the next editor. */
    void hold() {
        held.clear();
        awaited = null;
        holding = true;
    }

    /**
     * The editor is on screen inside this node: the first key typed once focus is inside it
     * hands over the kept keys before itself, so keys arrive in order whoever notices first.
     */
    void awaitFocusIn(Node container) {
        awaited = container;
    }

    /** Whether keys are being kept. */
    boolean holding() {
        return holding;
    }

    /** Hands the kept keys to the editor (which has focus), in the order typed, and stops keeping. */
    void deliverTo(Node editor) {
        holding = false;
        awaited = null;
        List<KeyEvent> keys = List.copyOf(held);
        held.clear();
        for (KeyEvent e : keys) {
            Event.fireEvent(editor, e.copyFor(editor, editor));
        }
    }

    /** Forgets the kept keys (the next screen is not a task) and stops keeping. */
    void drop() {
        holding = false;
        awaited = null;
        held.clear();
    }

    private void filter(KeyEvent e) {
        if (!holding || e.isShortcutDown() || e.isControlDown() || e.isAltDown() || e.isMetaDown()) {
            return;
        }
        Node focus = scene.getFocusOwner();
        if (awaited != null && focus != null && inside(focus, awaited)) {
            deliverTo(focus);
            return; // this key follows the kept ones, on its usual way
        }
        if (e.getEventType() == KeyEvent.KEY_TYPED) {
            String c = e.getCharacter();
            if (!c.isEmpty() && c.charAt(0) >= ' ' && c.charAt(0) != 127) {
                held.add(e);
            }
        } else if (e.getEventType() == KeyEvent.KEY_PRESSED && isWritingKey(e.getCode())) {
            held.add(e);
        }
        // every other key is stopped too: a Space or Enter must not press a button the screen focused meanwhile
        e.consume();
    }

    private static boolean inside(Node node, Node container) {
        for (Node n = node; n != null; n = n.getParent()) {
            if (n == container) {
                return true;
            }
        }
        return false;
    }

    private static boolean isWritingKey(KeyCode code) {
        return code == KeyCode.BACK_SPACE || code == KeyCode.DELETE || code == KeyCode.ENTER;
    }
}
