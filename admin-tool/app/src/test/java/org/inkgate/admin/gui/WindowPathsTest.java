package org.inkgate.admin.gui;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextInputControl;
import javafx.stage.Stage;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Issue 15 §1, driven headless as a test owner would: step 4 collects from a bundle the command
 * line built (no step 3 in this window), refuses an assignment table other than the bundle's,
 * step 2 never replaces a table silently, and one store name travels through the steps.
 */
@ExtendWith(ApplicationExtension.class)
class WindowPathsTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");
    private static final Path ROSTER = DemoSource.DEMO.resolve("roster.csv").toAbsolutePath();

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void collect_bundleBuiltByTheCommandLine_collectsInAFreshWindowAndLaterStepsKeepTheStore(FxRobot robot)
            throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261202, dir);
        Path packages = dir.resolve("packages");
        CommandLineSitting.packages(dir.resolve("keys"), bundle, packages, "H1012");
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        select(robot, 3);
        Path store = dir.resolve("results.db");
        fillCollect(robot, bundle, dir.resolve("assignment.csv"), store, packages);
        robot.clickOn("#collect");
        waitForWork(session);
        assertTrue(label(robot, "#collectCounts").startsWith("Imported 11, "), label(robot, "#collectCounts"));

        // step 5 takes over the store named in step 4: the test owner only presses the button
        select(robot, 4);
        assertEquals(store.toString(), text(robot, "#missingStore"));
        robot.clickOn("#showMissing");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(label(robot, "#missingReport").contains("candidate H1012"), label(robot, "#missingReport"));
    }

    @Test
    void collect_assignmentOtherThanTheBundles_refusedWithTheCandidatesAndNothingCollected(FxRobot robot)
            throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261202, dir);
        Path packages = dir.resolve("packages");
        CommandLineSitting.packages(dir.resolve("keys"), bundle, packages, "H1012");
        Path other = dir.resolve("other.csv");
        CommandLineSitting.admin("forms", EXAM.toString(), "--roster", ROSTER.toString(), "--seed", "5", "--out",
                other.toString());
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        select(robot, 3);
        Path store = dir.resolve("results.db");
        fillCollect(robot, bundle, other, store, packages);
        robot.clickOn("#collect");
        waitForWork(session);
        String counts = label(robot, "#collectCounts");
        assertTrue(counts.startsWith("The collection stopped."), counts);
        assertTrue(counts.contains("is not the one the bundle of"), counts);
        assertTrue(counts.matches("(?s).*candidate H10\\d\\d sits form F0\\d in the bundle but F0\\d in this table.*"),
                counts);
    }

    @Test
    void forms_tableExists_keptUntilReplaceIsTicked_andTheSeedIsShown(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        setText(robot, "#examFolder", DemoSource.copyExam(dir.resolve("exam-source")).toString());
        robot.clickOn("#checkExam");
        select(robot, 1);
        Path table = dir.resolve("assignment.csv");
        setText(robot, "#roster", ROSTER.toString());
        setText(robot, "#assignmentOut", table.toString());
        setText(robot, "#seed", "111");
        robot.clickOn("#assign");
        WaitForAsyncUtils.waitForFxEvents();
        byte[] first = Files.readAllBytes(table);

        setText(robot, "#seed", "");
        robot.clickOn("#assign");
        WaitForAsyncUtils.waitForFxEvents();
        String refused = label(robot, "#formsResult");
        assertTrue(refused.contains("already exists (seed 111, 12 candidates) and was kept"), refused);
        String drawn = text(robot, "#seed");
        assertTrue(refused.contains("the seed drawn now was " + drawn), refused);
        assertArrayEquals(first, Files.readAllBytes(table));

        robot.interact(() -> robot.lookup("#replaceAssignment").queryAs(CheckBox.class).setSelected(true));
        robot.clickOn("#assign");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(label(robot, "#formsResult").contains("assigned with seed " + drawn), label(robot, "#formsResult"));
        assertTrue(Files.readString(table).lines().skip(1).allMatch(l -> l.endsWith("," + drawn)));
        assertFalse(robot.lookup("#replaceAssignment").queryAs(CheckBox.class).isSelected(),
                "the choice holds for one replacement only");
    }

    @Test
    void store_defaultNameIsTheGuides_andStepFiveTakesOverWhatStepFourNamed(FxRobot robot) throws Exception {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        Path exam = DemoSource.copyExam(dir.resolve("exam-source"));
        setText(robot, "#examFolder", exam.toString());
        robot.clickOn("#checkExam");
        WaitForAsyncUtils.waitForFxEvents();
        select(robot, 3);
        assertEquals(dir.resolve("results.db").toAbsolutePath().toString(), text(robot, "#storeFile"));
        // the guides name the same file in every command example
        for (String guide : new String[] {"test-owner-guide.md", "rater-guide.md"}) {
            String md = Files.readString(Path.of("../../docs", guide));
            assertTrue(md.contains("results.db"), guide);
            assertFalse(md.contains("results.sqlite"), guide);
        }
        Path named = dir.resolve("elsewhere.db");
        setText(robot, "#storeFile", named.toString());
        select(robot, 4);
        assertEquals(named.toString(), text(robot, "#missingStore"), "not collected yet, still the store named before");
    }

    private static void fillCollect(FxRobot robot, Path bundle, Path assignment, Path store, Path packages) {
        setText(robot, "#collectBundle", bundle.toString());
        setText(robot, "#collectKeys", bundle.resolveSibling("keys").toString());
        setText(robot, "#collectAssignment", assignment.toString());
        setText(robot, "#collectRoster", ROSTER.toString());
        setText(robot, "#storeFile", store.toString());
        robot.interact(() -> robot.lookup("#packageFolders").queryAs(TextArea.class).setText(packages.toString()));
        robot.interact(() -> robot.lookup("#anyInstallation").queryAs(CheckBox.class).setSelected(true));
        setText(robot, "#collectPassphrase", CommandLineSitting.passphrase());
    }

    private static void select(FxRobot robot, int step) {
        robot.interact(() -> robot.lookup("#steps").queryListView().getSelectionModel().select(step));
        WaitForAsyncUtils.waitForFxEvents();
    }

    private static void setText(FxRobot robot, String query, String text) {
        robot.interact(() -> robot.lookup(query).queryAs(TextInputControl.class).setText(text));
    }

    private static String text(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(TextInputControl.class).getText();
    }

    private static String label(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(Label.class).getText();
    }

    private static void waitForWork(AdminSession session) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        WaitForAsyncUtils.waitFor(90, TimeUnit.SECONDS, () -> !session.work().busy().get());
        WaitForAsyncUtils.waitForFxEvents();
    }
}
