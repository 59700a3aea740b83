package org.inkgate.format.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads a text file the user wrote (roster, sheets, ratings, prompts) as UTF-8, and when it is not,
 * says so with the place: the line, the column and the bytes, and how to save it, instead of the
 * JDK's bare "Input length = 1".
 */
public final class Utf8Text {

    /** A file that is not UTF-8; the message names the file, the place and the fix. */
    public static final class NotUtf8Exception extends IOException {
        private final long line;

        NotUtf8Exception(String message, long line) {
            super(message);
            this.line = line;
        }

        /** The 1-based line holding the first bad bytes. */
        public long line() {
            return line;
        }
    }

    private Utf8Text() {
    }

    public static String read(Path file) throws IOException {
        return decode(file.toString(), Files.readAllBytes(file));
    }

    /** The text of {@code bytes}, which {@code name} held; refused naming the first place that is not UTF-8. */
    public static String decode(String name, byte[] bytes) throws NotUtf8Exception {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate((int) Math.min(Integer.MAX_VALUE - 8, (long) bytes.length + 1));
        CoderResult result = decoder.decode(in, out, true);
        if (!result.isError()) {
            result = decoder.flush(out);
        }
        if (!result.isError()) {
            return out.flip().toString();
        }
        int at = in.position();
        long line = 1;
        int lineStart = 0;
        for (int i = 0; i < at; i++) {
            if (bytes[i] == '\n') {
                line++;
                lineStart = i + 1;
            }
        }
        long column = StandardCharsets.UTF_8.decode(ByteBuffer.wrap(bytes, lineStart, at - lineStart)).length() + 1;
        StringBuilder shown = new StringBuilder();
        for (int i = at; i < Math.min(bytes.length, at + Math.max(1, result.length())); i++) {
            shown.append(String.format(" 0x%02X", bytes[i] & 0xFF));
        }
        throw new NotUtf8Exception(name + " is not UTF-8 text, the encoding Inkgate reads: line " + line + ", column "
                + column + " (byte " + (at + 1) + ") holds" + shown + ", which is not UTF-8 (a file saved as Latin-1 or"
                + " Windows-1252, say). Save it as UTF-8 (in a spreadsheet: \"CSV UTF-8\") and run again", line);
    }
}
