package org.inkgate.client;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

class LaunchCommandTest {

    @Test
    void parse_practiceAlone_opensTheDemo() {
        assertEquals(new LaunchCommand.PracticeDemo(), LaunchCommand.parse(List.of("--practice")));
    }

    @Test
    void parse_practiceWithFile_opensThatFile() {
        assertEquals(new LaunchCommand.PracticeFile(Path.of("exams/mock.inkexam")),
                LaunchCommand.parse(List.of("--practice", "exams/mock.inkexam")));
    }

    @Test
    void parse_help_showsHelp() {
        assertEquals(new LaunchCommand.ShowHelp(), LaunchCommand.parse(List.of("--help")));
    }

    @Test
    void parse_noArguments_isRefusedPointingToPractice() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> LaunchCommand.parse(List.of()));
        assertTrue(e.getMessage().contains("--practice"), e.getMessage());
    }

    @Test
    void parse_unknownOption_isRefusedNamingIt() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--live")));
        assertTrue(e.getMessage().contains("\"--live\""), e.getMessage());
    }

    @Test
    void parse_practiceWithTwoFiles_isRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--practice", "a.inkexam", "b.inkexam")));
    }

    @Test
    void parse_practiceFollowedByOption_isRefusedAsNotAFile() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LaunchCommand.parse(List.of("--practice", "--help")));
        assertTrue(e.getMessage().contains("is not a bundle file"), e.getMessage());
    }

    @Test
    void demoBundleCopy_builtClient_copiesTheEmbeddedBundleToATemporaryFile() throws Exception {
        Path copy = Launcher.demoBundleCopy();
        assertEquals("demo.inkexam", copy.getFileName().toString());
        assertTrue(java.nio.file.Files.size(copy) > 0);
    }
}
