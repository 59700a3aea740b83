package org.inkgate.client.task;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javafx.stage.Window;
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

/**
 * Screenshots of the task workspace at 1280x800 (invented task and answer), written to
 * target/screenshots on every build; to refresh the committed ones give
 * {@code -Dinkgate.screenshots.dir=/abs/path/docs/screenshots}. The spelling flags here come from
 * a stand-in checker, so the pictures do not depend on LanguageTool's word list.
 */
@ExtendWith(ApplicationExtension.class)
class WorkspaceScreenshotTest {

    static final String ANSWER = "Dear Council,\n\nI have taken the morning ferie to the mainland for twelve years. "
            + "It is how I get to work, and how my neighbours reach the clinic.\n\n"
            + "Please keep the early crossing and mend the gangway before the winter.";
    private Stage stage;
    private StageSize before;
    private WritingWorkspace workspace;
    private final RecordingLog log = new RecordingLog();

    @Start
    void start(Stage primary) {
        stage = primary;
        // the pictures are 1280x800 whatever an earlier test class left on the shared stage
        before = StageSize.set(primary, 1280, 800);
    }

    @AfterEach
    void close(FxRobot robot) {
        if (workspace != null) {
            robot.interact(workspace::close);
        }
        robot.interact(before::restore);
    }

    private void open(FxRobot robot, ResourcePolicy policy, DisplaySettings display) throws Exception {
        TaskTools tools = TestTools.toolsFor(policy, new TestTools.CountingFactory(TestTools.realPacks(),
                (m, words) -> new ScriptedChecker(m, Map.of("ferie", List.of("ferry", "fairy", "feria")))));
        workspace = Shown.show(robot, stage, TestTools.context(tools, log, ANSWER, display), new FakeClipboard(null));
        if (policy.spelling().checksSpelling()) {
            Shown.until("the flag", () -> !workspace.marks().get().flags().all().isEmpty());
        }
    }

    @Test
    void snapshot_noTools() throws Exception {
        FxRobot robot = new FxRobot();
        open(robot, ResourcePolicy.noTools(), DisplaySettings.standard());
        write(robot, "task-workspace-no-tools.png");
    }

    @Test
    void snapshot_allToolsWithSuggestionMenu() throws Exception {
        FxRobot robot = new FxRobot();
        open(robot, new ResourcePolicy(SpellingMode.SPELLING_AND_GRAMMAR, TestTools.GLOSSARY, TestTools.DICTIONARY, true, true,
                PastePolicy.WITHIN_RESPONSE), DisplaySettings.standard());
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.D).release(KeyCode.D, KeyCode.SHIFT, KeyCode.CONTROL);
        robot.write("crossing").type(KeyCode.ENTER);
        ListView<?> results = robot.lookup("#dictionaryResults").queryListView();
        Shown.until("dictionary entries", () -> !results.getItems().isEmpty());
        Shown.onFx(robot, () -> workspace.panel().orElseThrow().pages().stream().filter(p -> p instanceof DictionaryPage)
                .forEach(p -> ((DictionaryPage) p).openSelected()));
        Shown.until("the entry", () -> !robot.lookup("#dictionaryInsertable").queryListView().getItems().isEmpty());
        int at = ANSWER.indexOf("ferie") + 2;
        Shown.onFx(robot, () -> {
            workspace.focusEditor();
            workspace.area().moveTo(at);
        });
        robot.press(KeyCode.SHIFT, KeyCode.F10).release(KeyCode.F10, KeyCode.SHIFT);
        Shown.until("the suggestion menu", () -> menu() != null);
        write(robot, "task-workspace-all-tools.png");
    }

    @Test
    void snapshot_highContrast() throws Exception {
        FxRobot robot = new FxRobot();
        open(robot, new ResourcePolicy(SpellingMode.SUGGESTIONS, TestTools.GLOSSARY, null, false, true, PastePolicy.NONE),
                new DisplaySettings(1.0, 0.0, true));
        org.junit.jupiter.api.Assertions.assertTrue(workspace.view().getStyleClass().contains("high-contrast"));
        robot.press(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.G).release(KeyCode.G, KeyCode.SHIFT, KeyCode.CONTROL);
        robot.write("gang");
        Shown.until("glossary hits", () -> !robot.lookup("#glossaryResults").queryListView().getItems().isEmpty());
        write(robot, "task-workspace-high-contrast.png");
    }

    @Test
    void snapshot_largePrint() throws Exception {
        FxRobot robot = new FxRobot();
        open(robot, new ResourcePolicy(SpellingMode.UNDERLINE_ONLY, null, TestTools.DICTIONARY, false, true, PastePolicy.NONE),
                new DisplaySettings(DisplaySettings.LARGE_PRINT_SCALE, 0.8, false));
        // 16 px x 1.5 = 24 px type, line spacing 0.8 x 24 = 19.2 px (DisplayStyle's own rule)
        javafx.scene.text.Text first = robot.lookup(".answer-area .text").queryAs(javafx.scene.text.Text.class);
        assertEquals(24.0, first.getFont().getSize(), 0.01);
        assertEquals(19.2, robot.lookup(".answer-area .paragraph-text").queryAs(javafx.scene.text.TextFlow.class).getLineSpacing(), 0.01);
        write(robot, "task-workspace-large-print.png");
    }

    private static ContextMenu menu() {
        return Window.getWindows().stream().filter(w -> w instanceof ContextMenu && w.isShowing())
                .map(w -> (ContextMenu) w).findFirst().orElse(null);
    }

    /** The scene, with any open popup menu drawn where it sits (a popup is a window of its own). */
    private void write(FxRobot robot, String name) throws Exception {
        AtomicReference<BufferedImage> image = new AtomicReference<>();
        robot.interact(() -> {
            BufferedImage scene = PngSnapshots.snapshot(stage.getScene());
            ContextMenu open = menu();
            if (open != null) {
                BufferedImage popup = PngSnapshots.snapshot(open.getScene());
                Graphics2D g = scene.createGraphics();
                g.drawImage(popup, (int) (open.getX() - stage.getX() - stage.getScene().getX()),
                        (int) (open.getY() - stage.getY() - stage.getScene().getY()), null);
                g.dispose();
            }
            image.set(scene);
        });
        assertNotNull(image.get());
        assertEquals(1280, image.get().getWidth(), "picture width");
        assertEquals(800, image.get().getHeight(), "picture height");
        PngSnapshots.write(image.get(), Path.of("target", "screenshots", name));
        String dir = System.getProperty("inkgate.screenshots.dir");
        if (dir != null) {
            PngSnapshots.write(image.get(), Path.of(dir, name));
        }
    }
}
