package org.inkgate.client.sitting.killtest;

import java.nio.charset.StandardCharsets;
import java.util.Base64;

/**
 * The line protocol between the kill test and the process it types into. To the process (stdin):
 * {@code K <hex code point>} types one character at the caret, {@code B} is one backspace. From
 * the process (stdout): {@code READY <base64 UTF-8 text>} once the answer is typable, with the
 * text it starts from; {@code ACK <n>} after the n-th keystroke of this run has been applied to
 * the answer (and so handed to the process log). Other lines are ignored.
 */
public final class TypingProtocol {

    public static final String READY = "READY ";
    public static final String ACK = "ACK ";
    public static final String BACKSPACE = "B";
    public static final String KEY = "K ";

    private TypingProtocol() {
    }

    /** The READY line for a text. */
    public static String ready(String text) {
        return READY + Base64.getEncoder().encodeToString(text.getBytes(StandardCharsets.UTF_8));
    }

    /** The text of a READY line. */
    public static String readyText(String line) {
        return new String(Base64.getDecoder().decode(line.substring(READY.length()).strip()), StandardCharsets.UTF_8);
    }

    /** The command line for a keystroke: a code point, or -1 for backspace. */
    public static String command(int codePoint) {
        return codePoint < 0 ? BACKSPACE : KEY + Integer.toHexString(codePoint);
    }

    /** The keystroke of a command line: a code point, or -1 for backspace. */
    public static int keystroke(String line) {
        if (line.equals(BACKSPACE)) {
            return -1;
        }
        if (line.startsWith(KEY)) {
            return Integer.parseInt(line.substring(KEY.length()).strip(), 16);
        }
        throw new IllegalArgumentException("not a keystroke line: \"" + line + "\"");
    }
}
