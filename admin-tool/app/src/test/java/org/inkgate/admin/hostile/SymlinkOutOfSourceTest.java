package org.inkgate.admin.hostile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.testutil.DemoSource;
import org.inkgate.admin.testutil.ForgedPackages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An exam source whose prompt file is a symbolic link to a file outside the exam folder (an invented
 * private note here): {@code exam check} refuses it, naming the file and where it leads, and a link
 * that stays inside the folder is fine.
 */
class SymlinkOutOfSourceTest {

    @TempDir
    Path dir;

    @Test
    void examCheck_promptLinkedOutOfTheFolder_isRefused() throws Exception {
        Path source = DemoSource.copyExam(dir.resolve("exam-source"));
        Path secret = Files.writeString(dir.resolve("private-note.md"), "Invented private note, not for candidates.\n");
        Path prompt = source.resolve("prompts/ferry-complaint.md");
        Path inside = source.resolve("prompts/market-copy.md");
        Files.move(source.resolve("prompts/market-square.md"), inside);
        Files.delete(prompt);
        try {
            Files.createSymbolicLink(prompt, secret);
            Files.createSymbolicLink(source.resolve("prompts/market-square.md"), inside.getFileName());
        } catch (UnsupportedOperationException | java.io.IOException e) {
            assumeTrue(false, "symbolic links are not available here: " + e);
        }
        ForgedPackages.Run check = ForgedPackages.here("exam", "check", source.toString());
        assertEquals(InkgateAdmin.PROBLEMS, check.code(), check.out());
        assertTrue(check.out().contains("\"prompts/ferry-complaint.md\" is a symbolic link, or lies under one, that leads"
                + " out of the exam folder (to " + secret.toRealPath() + ")"), check.out());
        assertFalse(check.out().contains("market-square.md"), "a link inside the folder is fine: " + check.out());
    }
}
