package org.inkgate.admin.gui.export;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.stage.Stage;
import org.inkgate.admin.core.export.StoreExport;
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
import org.testfx.util.WaitForAsyncUtils;

/**
 * Issue 15 §2, "every long step shows progress and can be cancelled without leaving half a
 * result", for the window's export step, driven headless as a test owner would: Cancel is pressed
 * (the real button, on the JavaFX thread) at each step of a real export over a real collected
 * store, including the moment just before the files move into place, while the export worker
 * waits; the folder and its parent are then byte for byte as before and the step says "Cancelled".
 * A Cancel pressed once the files are moving is refused, and the step says the export is complete.
 * The step's own progress bar follows the core's steps.
 */
@ExtendWith(ApplicationExtension.class)
class ExportCancelStepTest {

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void cancel_atEveryStepAndJustBeforeTheMove_leavesTheFolderAsItWas(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir.resolve("study"), List.of());
        Path place = Files.createDirectories(dir.resolve("place"));
        Path out = place.resolve("export");
        CommandLineSitting.admin("export", "--store", rated.file().toString(), "--out", out.toString());
        Files.writeString(out.resolve("notes.txt"), "the test owner's notes");
        Map<String, byte[]> before = files(place);
        AdminSession session = new AdminSession();
        ExportModel model = open(robot, session, rated, out);

        long steps = StoreExport.steps(1);
        for (long at = 0; at <= steps; at++) {
            long cancelAt = at; // the last round presses Cancel just before the commit point
            List<Boolean> pressed = new ArrayList<>();
            model.watch = new StoreExport.Progress() {
                @Override
                public void step(long done, long total, String what) {
                    if (done == cancelAt && cancelAt < steps) {
                        pressed.add(pressCancel(robot));
                    }
                }

                @Override
                public void beforePublish() {
                    if (cancelAt == steps) {
                        pressed.add(pressCancel(robot));
                    }
                }
            };
            robot.clickOn("#export");
            StepDriver.waitForWork(session);
            String shown = StepDriver.label(robot, "#exportWritten");
            assertEquals(List.of(true), pressed, "Cancel pressed once, at " + at);
            assertTrue(shown.startsWith("Cancelled. Nothing of this export was put into"), at + ": " + shown);
            assertSameFiles(before, files(place), "after Cancel at step " + at);
        }
    }

    @Test
    void cancel_onceTheFilesAreMoving_isRefusedAndTheStepSaysTheExportIsComplete(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir.resolve("study"), List.of());
        Path out = dir.resolve("place").resolve("export");
        AdminSession session = new AdminSession();
        ExportModel model = open(robot, session, rated, out);
        List<String> toldWhilePublishing = new ArrayList<>();
        List<Double> progressBeforeTheMove = new ArrayList<>();
        model.watch = new StoreExport.Progress() {
            @Override
            public void step(long done, long total, String what) {
            }

            @Override
            public void beforePublish() {
                WaitForAsyncUtils.waitForFxEvents();
                robot.interact(() -> {
                    progressBeforeTheMove.add(robot.lookup("#exportProgress").queryAs(ProgressBar.class).getProgress());
                    toldWhilePublishing.add(robot.lookup("#exportStep").queryAs(Label.class).getText());
                });
                try {
                    StepDriver.shoot1024(robot, stage, "admin-exports-progress.png"); // the guide's picture of a running export
                } catch (Exception e) {
                    throw new AssertionError("could not take the picture of the running export", e);
                }
            }

            @Override
            public void publishing() {
                pressCancel(robot);
                robot.interact(() -> toldWhilePublishing.add(StepDriver.label(robot, "#exportWritten")));
            }
        };
        robot.clickOn("#export");
        StepDriver.waitForWork(session);

        assertEquals(List.of(0.75), progressBeforeTheMove, "3 of 4 steps (three parts, then the move) before the move");
        assertEquals("moving the files into " + out, toldWhilePublishing.get(0));
        assertTrue(toldWhilePublishing.get(1).startsWith("Too late to cancel"), toldWhilePublishing.get(1));
        String shown = StepDriver.label(robot, "#exportWritten");
        assertTrue(shown.startsWith("Cancel came too late"), shown);
        assertFalse(shown.contains("Cancelled."), shown);
        assertTrue(shown.contains("qti-results/ 12 assessmentResult files"), shown);
        assertTrue(Files.isRegularFile(out.resolve(rated.exam().examId()).resolve("xapi-statements.jsonl")));
        assertEquals(List.of(), hidden(out.getParent()));
    }

    private ExportModel open(FxRobot robot, AdminSession session, RatedStore rated, Path out) {
        robot.interact(() -> AdminWindow.show(stage, session));
        StepDriver.select(robot, "Exports");
        StepDriver.setText(robot, "#exportStore", rated.file().toString());
        StepDriver.setText(robot, "#exportFolder", out.toString());
        return (ExportModel) robot.lookup("#export").queryAs(Button.class).getProperties().get(ExportModel.class);
    }

    /** Presses the step's Cancel button on the JavaFX thread and waits for it: true when it could be pressed. */
    private static boolean pressCancel(FxRobot robot) {
        List<Boolean> enabled = new ArrayList<>();
        robot.interact(() -> {
            Button cancel = robot.lookup("#cancelExport").queryAs(Button.class);
            enabled.add(!cancel.isDisabled());
            cancel.fire();
        });
        return enabled.get(0);
    }

    private static void assertSameFiles(Map<String, byte[]> before, Map<String, byte[]> after, String when) {
        assertEquals(before.keySet(), after.keySet(), "files or folders changed " + when);
        before.forEach((name, bytes) -> assertArrayEquals(bytes, after.get(name), name + " changed " + when));
    }

    /** Every file and folder under {@code root}, hidden ones too; folders with no bytes. */
    private static Map<String, byte[]> files(Path root) throws Exception {
        Map<String, byte[]> all = new TreeMap<>();
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : s.toList()) {
                all.put(root.relativize(p).toString(), Files.isRegularFile(p) ? Files.readAllBytes(p) : new byte[0]);
            }
        }
        return all;
    }

    private static List<String> hidden(Path folder) throws Exception {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).filter(n -> n.startsWith(".")).toList();
        }
    }
}
