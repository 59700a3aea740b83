package org.inkgate.client.task;

import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;

/** The clipboard the editor reads and writes; the system one in a sitting, a fake in tests. */
interface ClipboardAccess {

    /** The plain text on the clipboard, or null when it holds none. */
    String readText();

    /** Puts plain text on the clipboard, replacing what was there. */
    void writeText(String text);

    /** The operating system's clipboard (call on the JavaFX thread). */
    static ClipboardAccess system() {
        return new ClipboardAccess() {
            @Override
            public String readText() {
                Clipboard c = Clipboard.getSystemClipboard();
                return c.hasString() ? c.getString() : null;
            }

            @Override
            public void writeText(String text) {
                ClipboardContent content = new ClipboardContent();
                content.putString(text);
                Clipboard.getSystemClipboard().setContent(content);
            }
        };
    }
}
