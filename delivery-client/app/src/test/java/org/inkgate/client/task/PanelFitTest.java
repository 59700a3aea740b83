package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Scene;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.client.sitting.ui.SittingShell;
import org.inkgate.client.sitting.ui.SittingTheme;
import org.inkgate.client.sitting.ui.screen.TaskScreen;
import org.inkgate.client.testutil.LayoutCheck;
import org.inkgate.client.testutil.PngSnapshots;
import org.inkgate.client.testutil.StageSize;
import org.inkgate.packs.broker.TaskTools;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Issue 13, "screens that fit": each page of the resource panel (dictionary with an entry open,
 * glossary with an entry open, spelling with a flag's suggestions; insertion from the panel
 * allowed, so every button is there) inside the sitting's own frame (top strip, task footer,
 * sitting stylesheet), at 1024x768, 1280x800 and 1920x1080, in normal print, large print, high
 * contrast and both, checked by {@link LayoutCheck}. Pictures go to target/screenshots/fit/.
 * Real WordNet and demo glossary packs; the spelling flag on "ferie" comes from a stand-in checker.
 */
@ExtendWith(ApplicationExtension.class)
class PanelFitTest {

    private Stage stage;
    private StageSize before;
    private WritingWorkspace workspace;
    private final List<String> problems = new ArrayList<>();

    @Start
    void start(Stage primary) {
        stage = primary;
        // the workspace opens at 1280x800 whatever an earlier test class left; fits() then walks the sizes
        before = StageSize.set(primary, 1280, 800);
    }

    @AfterEach
    void close(FxRobot robot) {
        if (workspace != null) {
            robot.interact(workspace::close);
        }
        robot.interact(before::restore);
    }

    @Test
    void everyPanelPage_normalPrint_fits(FxRobot robot) throws Exception {
        walk(robot, DisplaySettings.standard(), "normal");
    }

    @Test
    void everyPanelPage_largePrint_fits(FxRobot robot) throws Exception {
        walk(robot, new DisplaySettings(DisplaySettings.LARGE_PRINT_SCALE, 0.3, false), "large-print");
    }

    @Test
    void everyPanelPage_highContrast_fits(FxRobot robot) throws Exception {
        walk(robot, new DisplaySettings(1.0, 0.0, true), "high-contrast");
    }

    @Test
    void everyPanelPage_largePrintHighContrast_fits(FxRobot robot) throws Exception {
        walk(robot, new DisplaySettings(DisplaySettings.LARGE_PRINT_SCALE, 0.3, true), "large-print-high-contrast");
    }

    private void walk(FxRobot robot, DisplaySettings display, String print) throws Exception {
        ResourcePolicy all = new ResourcePolicy(SpellingMode.SPELLING_AND_GRAMMAR, TestTools.GLOSSARY, TestTools.DICTIONARY,
                true, true, PastePolicy.WITHIN_RESPONSE);
        TaskTools tools = TestTools.toolsFor(all, new TestTools.CountingFactory(TestTools.realPacks(),
                (m, words) -> new ScriptedChecker(m, Map.of("ferie", List.of("ferry", "fairy", "feria")))));
        TaskContext context = TestTools.context(tools, new RecordingLog(), WorkspaceScreenshotTest.ANSWER, display);
        robot.interact(() -> {
            workspace = TaskWorkspaces.open(context, new FakeClipboard(null));
            // the frame the sitting puts a task in (SittingFlow: shell, task screen, theme of the roster's display)
            SittingShell shell = new SittingShell("Harbour Letters: Practice Sitting (invented)");
            shell.who("Candidate T0007");
            shell.time("25:00", "25 minutes left", false);
            TaskScreen screen = new TaskScreen("Task 1 of 2: " + TestTools.TASK.title(), workspace.view(), () -> { });
            shell.show(screen.root());
            Scene scene = new Scene(shell.root(), 1280, 800);
            SittingTheme.install(scene);
            SittingTheme.apply(shell.root(), display);
            stage.setScene(scene);
            stage.show();
            stage.requestFocus();
            workspace.focusEditor();
        });
        Shown.until("the flag", () -> !workspace.marks().get().flags().all().isEmpty());

        shortcut(robot, KeyCode.D);
        robot.write("crossing").type(KeyCode.ENTER);
        ListView<?> entries = robot.lookup("#dictionaryResults").queryListView();
        Shown.until("dictionary entries", () -> !entries.getItems().isEmpty());
        Shown.onFx(robot, () -> page(DictionaryPage.class).openSelected());
        ListView<?> words = robot.lookup("#dictionaryInsertable").queryListView();
        Shown.until("the entry's words", () -> !words.getItems().isEmpty());
        Shown.onFx(robot, () -> words.getSelectionModel().selectFirst());
        fits(robot, print, "panel-dictionary");

        shortcut(robot, KeyCode.G);
        robot.write("gangway");
        ListView<?> hits = robot.lookup("#glossaryResults").queryListView();
        Shown.until("glossary hits", () -> !hits.getItems().isEmpty());
        Shown.onFx(robot, () -> page(GlossaryPage.class).openSelected());
        ListView<?> terms = robot.lookup("#glossaryInsertable").queryListView();
        Shown.until("the entry's terms", () -> !terms.getItems().isEmpty());
        Shown.onFx(robot, () -> terms.getSelectionModel().selectFirst());
        fits(robot, print, "panel-glossary");

        shortcut(robot, KeyCode.K);
        Shown.onFx(robot, () -> {
            SuggestionsPage p = page(SuggestionsPage.class);
            p.focusStart();
            p.showSelected();
        });
        fits(robot, print, "panel-spelling");

        assertTrue(problems.isEmpty(), problems.size() + " layout(s) do not fit:\n" + String.join("\n", problems));
    }

    private <T extends ToolPage> T page(Class<T> kind) {
        return kind.cast(workspace.panel().orElseThrow().pages().stream().filter(kind::isInstance).findFirst().orElseThrow());
    }

    private static void shortcut(FxRobot robot, KeyCode key) {
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, key).release(key, KeyCode.SHIFT, KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void fits(FxRobot robot, String print, String screen) throws Exception {
        for (int[] size : LayoutCheck.SIZES) {
            robot.interact(() -> StageSize.apply(stage, size[0], size[1]));
            WaitForAsyncUtils.waitForFxEvents();
            WaitForAsyncUtils.sleep(150, TimeUnit.MILLISECONDS);
            WaitForAsyncUtils.waitForFxEvents();
            AtomicReference<List<String>> found = new AtomicReference<>();
            AtomicReference<BufferedImage> image = new AtomicReference<>();
            robot.interact(() -> {
                found.set(LayoutCheck.problems(stage.getScene()));
                image.set(PngSnapshots.snapshot(stage.getScene()));
            });
            if (!found.get().isEmpty()) {
                problems.add(screen + " at " + size[0] + "x" + size[1] + " in " + print + ":\n    "
                        + String.join("\n    ", found.get()));
            }
            PngSnapshots.write(image.get(), Path.of("target", "screenshots", "fit",
                    print + "-" + size[0] + "x" + size[1] + "-" + screen + ".png"));
        }
    }
}
