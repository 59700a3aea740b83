package org.inkgate.admin.core.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15 §2, "cancelled without leaving half a result", for the hardest stop: the process killed
 * (no shutdown hook runs) while an export of several exams is moving its exam folders into an
 * export folder that holds an earlier export. A real child JVM is halted after the first exam
 * folder is moved in; the folder then holds one new exam and two old ones. The next run into the
 * same folder must finish the killed run's moves before anything else, so no mix survives it, and
 * say which entries it finished.
 */
class StagedFolderKillTest {

    private static final List<String> EXAMS = List.of("exam-a", "exam-b", "exam-c");

    @Test
    void killedWhileMovingExamFoldersIn_theNextRunFinishesTheMoves(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("exports");
        for (String exam : EXAMS) {
            write(out.resolve(exam), "old");
        }

        Process child = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), KilledPublisher.class.getName(), out.toString())
                .redirectErrorStream(true).start();
        String said = new String(child.getInputStream().readAllBytes());
        assertTrue(child.waitFor(60, TimeUnit.SECONDS), "the child JVM did not end");
        assertEquals(KilledPublisher.HALTED, child.exitValue(), "the child should have been halted mid-move: " + said);
        assertEquals(Map.of("exam-a", "new", "exam-b", "old", "exam-c", "old"), contents(out),
                "the kill should leave the folder mixed, which is what the next run must mend");

        try (StagedFolder next = StagedFolder.open(out, new Cancellation())) {
            assertEquals(List.of("exam-b", "exam-c"), next.finishedEarlierRun());
            assertEquals(Map.of("exam-a", "new", "exam-b", "new", "exam-c", "new"), contents(out),
                    "the killed run's remaining exam folders are moved in before the next run writes");
        }
        try (Stream<Path> s = Files.list(out)) {
            assertEquals(List.of("exam-a", "exam-b", "exam-c"),
                    s.map(p -> p.getFileName().toString()).sorted().toList(), "no hidden folder or set-aside copy is left");
        }
    }

    @Test
    void aRunKilledBeforeItsMoves_isDiscardedAndTheFolderKeptAsItWas(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("exports");
        write(out.resolve("exam-a"), "old");
        Path staging = out.resolve(".exports.partial");
        write(staging.resolve("exam-a"), "half-written"); // no publishing note: the run was still writing

        try (StagedFolder next = StagedFolder.open(out, new Cancellation())) {
            assertEquals(List.of(), next.finishedEarlierRun());
        }
        assertEquals(Map.of("exam-a", "old"), contents(out));
        assertFalse(Files.exists(staging));
    }

    /** The exam folders in {@code out} and the word each holds. */
    private static Map<String, String> contents(Path out) throws IOException {
        Map<String, String> m = new TreeMap<>();
        try (Stream<Path> s = Files.list(out)) {
            for (Path p : s.filter(Files::isDirectory).filter(p -> !p.getFileName().toString().startsWith(".")).toList()) {
                m.put(p.getFileName().toString(), Files.readString(p.resolve("responses.csv")));
            }
        }
        return m;
    }

    private static void write(Path examFolder, String word) throws IOException {
        Files.createDirectories(examFolder);
        Files.writeString(examFolder.resolve("responses.csv"), word);
    }

    /** The child: stages three new exam folders and is halted after moving the first into place. */
    public static final class KilledPublisher {
        static final int HALTED = 137;

        public static void main(String[] args) throws Exception {
            Path out = Path.of(args[0]);
            try (StagedFolder staged = StagedFolder.open(out, new Cancellation())) {
                for (String exam : EXAMS) {
                    write(staged.folder().resolve(exam), "new");
                }
                staged.publish(new StagedFolder.Moments() {
                    @Override
                    public void moved(String entry) {
                        Runtime.getRuntime().halt(HALTED); // as a kill: no shutdown hook, no finally
                    }
                });
            }
            System.exit(1); // not reached when the hook halts
        }
    }
}
