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

    private final List<KeyEvent> held = new ArrayList<>();
    private boolean holding;

    TypeAhead(Scene scene) {
        scene.addEventFilter(KeyEvent.ANY, this::filter);
    }

    /** From now on, writing keys are kept for the next editor. */
    void hold() {
        held.clear();
        holding = true;
    }

    /** Whether keys are being kept. */
    boolean holding() {
        return holding;
    }

    /** Hands the kept keys to the editor (which has focus), in the order typed, and stops keeping. */
    void deliverTo(Node editor) {
        holding = false;
        List<KeyEvent> keys = List.copyOf(held);
        held.clear();
        for (KeyEvent e : keys) {
            Event.fireEvent(editor, e.copyFor(editor, editor));
        }
    }

    /** Forgets the kept keys (the next screen is not a task) and stops keeping. */
    void drop() {
        holding = false;
        held.clear();
    }

    private void filter(KeyEvent e) {
        if (!holding || e.isShortcutDown() || e.isControlDown() || e.isAltDown() || e.isMetaDown()) {
            return;
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

    private static boolean isWritingKey(KeyCode code) {
        return code == KeyCode.BACK_SPACE || code == KeyCode.DELETE || code == KeyCode.ENTER;
    }
}
