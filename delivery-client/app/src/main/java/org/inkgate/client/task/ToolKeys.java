package org.inkgate.client.task;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.input.KeyEvent;
import org.inkgate.packs.policy.Tool;

/**
 * The workspace's keyboard shortcuts to the panel. Only tools with a page get a shortcut, so a
 * forbidden tool has no key that reaches it; a task without tools has none of these keys at all.
 */
final class ToolKeys {

    static final KeyCombination DICTIONARY = new KeyCodeCombination(KeyCode.D, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN);
    static final KeyCombination GLOSSARY = new KeyCodeCombination(KeyCode.G, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN);
    static final KeyCombination SPELLING = new KeyCodeCombination(KeyCode.K, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN);
    /** Moves between the answer and the panel (a common desktop key for switching panes). */
    static final KeyCombination SWITCH = new KeyCodeCombination(KeyCode.F6);

    private final Map<Tool, KeyCombination> keys = new LinkedHashMap<>(); // in tab order, for the help line

    ToolKeys(List<Tool> withPages) {
        for (Tool t : withPages) {
            switch (t) {
                case DICTIONARY -> keys.put(t, DICTIONARY);
                case GLOSSARY -> keys.put(t, GLOSSARY);
                case SPELLING -> keys.put(t, SPELLING);
                case GRAMMAR -> { } // grammar flags share the spelling page
            }
        }
    }

    /** The tool whose shortcut this key event is, if its page exists. */
    Tool match(KeyEvent e) {
        for (Map.Entry<Tool, KeyCombination> k : keys.entrySet()) {
            if (k.getValue().match(e)) {
                return k.getKey();
            }
        }
        return null;
    }

    /** One line naming the keys that exist in this task. */
    String help() {
        List<String> parts = new ArrayList<>();
        keys.forEach((t, k) -> parts.add(k.getDisplayText() + " " + TaskEvents.wire(t)));
        parts.add("F6 answer \u2194 tools");
        parts.add("Esc back to your answer");
        return String.join("  \u00B7  ", parts);
    }
}
