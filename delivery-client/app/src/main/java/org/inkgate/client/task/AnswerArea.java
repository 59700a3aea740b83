package org.inkgate.client.task;

import java.util.Objects;
import java.util.function.Consumer;
import javafx.scene.AccessibleRole;
import javafx.scene.input.DragEvent;
import javafx.scene.input.InputMethodEvent;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import org.fxmisc.richtext.StyleClassedTextArea;
import org.fxmisc.richtext.util.UndoUtils;
import org.inkgate.format.response.AnswerCharacters;

/**
 * The answer editor: plain text in a RichTextFX area whose only styles are the checker's
 * underlines. Undo covers text only, never styles. Copy, cut and paste go through the task's
 * {@link PasteGate}; nothing can be dragged in or dragged about. Every change is made under a
 * {@link ChangeSource} so the log can say where the text came from. Input methods are left to
 * RichTextFX's own handling, untouched.
 */
final class AnswerArea extends StyleClassedTextArea {

    private final PasteGate gate;
    private final ClipboardAccess clipboard;
    private final Consumer<PasteGate.Refuse> onRefused;
    private ChangeSource source = ChangeSource.TYPING;

    AnswerArea(PasteGate gate, ClipboardAccess clipboard, Consumer<PasteGate.Refuse> onRefused) {
        super(false);
        this.gate = Objects.requireNonNull(gate, "gate");
        this.clipboard = Objects.requireNonNull(clipboard, "clipboard");
        this.onRefused = Objects.requireNonNull(onRefused, "onRefused");
        getStyleClass().add("answer-area");
        setWrapText(true);
        // typed text never inherits an underline from the word before it
        setUseInitialStyleForInsertion(true);
        setUndoManager(UndoUtils.plainTextUndoManager(this));
        // no moving of selected text by dragging, and nothing dropped in from outside
        setOnSelectionDropped(e -> { });
        addEventFilter(DragEvent.ANY, DragEvent::consume);
        setAccessibleRole(AccessibleRole.TEXT_AREA);
        // input methods (IME): RichTextFX sets its own handler and InputMethodRequests where the
        // platform supports them; nothing here filters or consumes InputMethodEvents
        // Tab types a tab, as in any text area; Ctrl+Tab (Shift for backwards) leaves the answer
        addEventFilter(KeyEvent.KEY_PRESSED, e -> {
            if (e.getCode() == KeyCode.TAB && e.isShortcutDown()) {
                e.consume();
                FocusWalk.move(this, e.isShiftDown());
            }
        });
    }

    /** Where the change being made now comes from. */
    ChangeSource source() {
        return source;
    }

    /** Makes a change under the given source (panel insertions, accepted suggestions...). */
    void changeAs(ChangeSource as, Runnable change) {
        ChangeSource before = source;
        source = as;
        try {
            change.run();
        } finally {
            source = before;
        }
    }

    @Override
    public void copy() {
        String selected = getSelectedText();
        if (gate.copyAllowed() && !selected.isEmpty()) {
            clipboard.writeText(selected);
            gate.copied(selected);
        }
    }

    @Override
    public void cut() {
        if (!isEditable() || !gate.copyAllowed() || getSelectedText().isEmpty()) {
            return;
        }
        copy();
        replaceSelection("");
    }

    @Override
    public void paste() {
        if (!isEditable()) {
            return;
        }
        switch (gate.decide(clipboard.readText())) {
            case PasteGate.Insert insert -> changeAs(ChangeSource.PASTE, () -> replaceSelection(insert.text()));
            case PasteGate.Refuse refuse -> onRefused.accept(refuse);
        }
    }

    @Override
    public void undo() {
        if (isEditable()) {
            changeAs(ChangeSource.UNDO, super::undo);
        }
    }

    @Override
    public void redo() {
        if (isEditable()) {
            changeAs(ChangeSource.REDO, super::redo);
        }
    }

    /**
     * Every insertion (typing, input methods, paste, panel insertions) ends here; control characters
     * an answer may not hold ({@link AnswerCharacters}) are dropped before the text changes, so the
     * change the log records is the change the answer gets.
     */
    @Override
    public void replaceText(int start, int end, String text) {
        super.replaceText(start, end, AnswerCharacters.clean(text));
    }

    /** Passes an input-method event to RichTextFX's own handling (tests on platforms without input methods). */
    void inputMethodEvent(InputMethodEvent e) {
        handleInputMethodEvent(e);
    }
}
