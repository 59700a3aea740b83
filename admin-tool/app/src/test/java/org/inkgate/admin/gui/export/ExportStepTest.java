package org.inkgate.admin.gui.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import javafx.stage.Stage;
import org.inkgate.admin.core.testutil.QtiSchemas;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.AdminWindow;
import org.inkgate.admin.gui.StepDriver;
import org.inkgate.admin.gui.rating.RatedStore;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Issue 15 §2 (exports), driven as a test owner would: the export step over a store the real
 * collect made writes the same files as {@code inkgate-admin export} and shows what it wrote;
 * the QTI results are checked against the official QTI 3.0 results schema (1EdTech).
 */
@ExtendWith(ApplicationExtension.class)
class ExportStepTest {

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void export_collectedStore_sameFilesAndSummaryAsTheCommand(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir.resolve("study"), List.of("R1", "R2"));
        Path windowOut = dir.resolve("window-export");
        Path commandOut = dir.resolve("command-export");
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Exports");
        StepDriver.setText(robot, "#exportStore", rated.file().toString());
        StepDriver.setText(robot, "#exportFolder", windowOut.toString());
        robot.clickOn("#export");
        StepDriver.waitForWork(session);
        String shown = StepDriver.label(robot, "#exportWritten");

        String printed = CommandLineSitting.admin("export", "--store", rated.file().toString(), "--out",
                commandOut.toString());
        assertEquals(printed.strip(), shown.replace(windowOut.toAbsolutePath().toString(),
                commandOut.toAbsolutePath().toString()).strip());
        Map<String, byte[]> window = files(windowOut);
        Map<String, byte[]> command = files(commandOut);
        assertEquals(command.keySet(), window.keySet());
        command.forEach((name, bytes) -> assertTrue(java.util.Arrays.equals(bytes, window.get(name)), name));

        // the demo roster (src/demo/roster.csv) has 12 invented candidates: one package and one results file each
        String exam = rated.exam().examId();
        List<Path> qti;
        try (Stream<Path> s = Files.list(windowOut.resolve(exam).resolve("qti-results"))) {
            qti = s.sorted().toList();
        }
        assertEquals(12, qti.size());
        for (Path file : qti) {
            assertEquals(List.of(), QtiSchemas.problems(QtiSchemas.RESULTS, file), file.toString());
        }
        assertTrue(shown.contains("qti-results/ 12 assessmentResult files"), shown);
        assertTrue(shown.contains("handle them under your data-protection rules"), shown);
        assertFalse(session.work().busy().get());
        StepDriver.shoot1024(robot, stage, "admin-exports.png");
    }

    /**
     * Issue 15 §2: the window's export replaces each exam's folder whole, as the command does, so a
     * file of an earlier export (here one for a candidate no longer in the store) is never mixed into
     * the new one; the test owner's own files beside the exam folders stay.
     */
    @Test
    void export_overAnEarlierExport_replacesTheExamFolderWholeAsTheCommandDoes(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir.resolve("study"), List.of());
        Path out = dir.resolve("export");
        String first = CommandLineSitting.admin("export", "--store", rated.file().toString(), "--out", out.toString());
        assertTrue(first.contains("qti-results/"), first);
        Path stale = out.resolve(rated.exam().examId()).resolve("qti-results").resolve("from-an-earlier-roster.xml");
        Files.writeString(stale, "<stale/>");
        Files.writeString(out.resolve("notes.txt"), "the test owner's notes");

        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Exports");
        StepDriver.setText(robot, "#exportStore", rated.file().toString());
        StepDriver.setText(robot, "#exportFolder", out.toString());
        robot.clickOn("#export");
        StepDriver.waitForWork(session);

        assertTrue(StepDriver.label(robot, "#exportWritten").contains("qti-results/ 12 assessmentResult files"));
        assertFalse(Files.exists(stale), "a file of the earlier export is mixed into the new one");
        assertEquals("the test owner's notes", Files.readString(out.resolve("notes.txt")));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(List.of(), s.filter(p -> p.getFileName().toString().startsWith(".")).toList(),
                    "hidden working folder left beside the export");
        }
        try (Stream<Path> s = Files.list(out)) {
            assertEquals(List.of(), s.filter(p -> p.getFileName().toString().startsWith(".")).toList(),
                    "hidden working folder left in the export folder");
        }
    }

    @Test
    void export_noStoreYet_saysSoAndWritesNothing(FxRobot robot) {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Exports");
        Path missing = dir.resolve("nowhere.db");
        StepDriver.setText(robot, "#exportStore", missing.toString());
        StepDriver.setText(robot, "#exportFolder", dir.resolve("out").toString());
        robot.clickOn("#export");
        assertTrue(StepDriver.label(robot, "#exportWritten").contains("There is no results store at " + missing));
        assertFalse(Files.exists(dir.resolve("out")));
    }

    private static Map<String, byte[]> files(Path root) throws Exception {
        Map<String, byte[]> all = new TreeMap<>();
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                all.put(root.relativize(p).toString(), Files.readAllBytes(p));
            }
        }
        return all;
    }
}
