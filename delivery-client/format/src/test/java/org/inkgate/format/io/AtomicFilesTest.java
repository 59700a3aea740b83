package org.inkgate.format.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The file system's own answers (java.nio.file.Files) for what AtomicFiles leaves behind. */
class AtomicFilesTest {

    @TempDir
    Path dir;

    @Test
    void write_replacesTheTargetWhole_andLeavesNoTemporaryFile() throws Exception {
        Path target = dir.resolve("report.txt");
        Files.writeString(target, "old");
        AtomicFiles.write(target, out -> out.write("new".getBytes(StandardCharsets.UTF_8)));
        assertEquals("new", Files.readString(target));
        try (var files = Files.list(dir)) {
            assertEquals(List.of("report.txt"), files.map(f -> f.getFileName().toString()).toList());
        }
    }

    @Test
    void moveIntoPlace_namesTheWrittenFile() throws Exception {
        Path written = Files.write(dir.resolve("store.db.incomplete"), new byte[] {1, 2, 3});
        Path target = dir.resolve("store.db");
        AtomicFiles.moveIntoPlace(written, target);
        assertArrayEquals(new byte[] {1, 2, 3}, Files.readAllBytes(target));
        assertFalse(Files.exists(written));
    }

    @Test
    void moveIntoPlace_refusesATargetThatExists_changingNothing() throws Exception {
        Path written = Files.write(dir.resolve("store.db.incomplete"), new byte[] {1, 2, 3});
        Path target = Files.write(dir.resolve("store.db"), new byte[] {9});
        assertThrows(FileAlreadyExistsException.class, () -> AtomicFiles.moveIntoPlace(written, target));
        assertArrayEquals(new byte[] {9}, Files.readAllBytes(target));
        assertTrue(Files.exists(written));
    }
}
