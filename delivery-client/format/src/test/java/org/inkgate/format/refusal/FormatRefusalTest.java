package org.inkgate.format.refusal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.inkgate.format.archive.ArchiveLimits;
import org.inkgate.format.archive.HostileArchives;
import org.inkgate.format.archive.SafeZipReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FormatRefusalTest {

    @TempDir
    Path dir;

    @Test
    void message_entryNameWithTerminalEscapesAndNewlines_isShownEscaped() throws Exception {
        Path file = dir.resolve("escape.inkresp");
        HostileArchives.writeRaw(file, Map.entry("x\u001b[2J\r\nOK: all packages verified\u202e", new byte[] {1}));
        UnsafeEntryName refusal = assertThrows(UnsafeEntryName.class, () -> SafeZipReader.open(file, ArchiveLimits.defaults()).close());
        String message = refusal.getMessage();
        assertTrue(message.chars().noneMatch(c -> c < 0x20 || c == 0x7f || c == 0x202e), message);
        assertTrue(message.contains("x\\u001b[2J\\u000d\\u000aOK"), message);
    }

    @Test
    void printable_ordinaryText_isUnchanged() {
        assertEquals("exam.inkexam: entry \"prompts/café.md\" is missing",
                FormatRefusal.printable("exam.inkexam: entry \"prompts/café.md\" is missing"));
    }
}
