package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.TextArea;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingDesk.Kind;
import org.inkgate.admin.core.source.ExamSource;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Issue 15 §3: beside the script the desk shows the task's prompt (from a store made by the real
 * collect: the demo's prompt files, src/demo/exam-source/prompts) and the rubric's band
 * descriptors (rubric.yaml); a long task name stays readable in full.
 */
@ExtendWith(ApplicationExtension.class)
class DeskTaskContextTest {

    private static final String LONG_TASK = "letter-to-the-harbour-office-about-the-winter-ferry-timetable-and-market-days";
    private static final String LONG_TITLE = "A letter to the harbour office about the winter ferry timetable, the market"
            + " days and the school boat (invented)";

    @TempDir
    Path dir;
    private Stage stage;
    private final List<AutoCloseable> open = new ArrayList<>();

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @AfterEach
    void closeAll(FxRobot robot) throws Exception {
        robot.interact(() -> stage.hide());
        for (AutoCloseable c : open.reversed()) {
            c.close();
        }
    }

    @Test
    void desk_overACollectedStore_showsThePromptFileAndEveryBandDescriptorBesideTheScript(FxRobot robot)
            throws Exception {
        RatedStore rated = RatedStore.make(dir, List.of("rater-a", "rater-b", "rater-c"));
        var store = rated.open();
        open.add(store);
        DeskModel model = new DeskModel(store);
        open.add(model);
        robot.interact(() -> DeskWindow.show(stage, model));
        DeskShots.settle(model);
        robot.type(KeyCode.ENTER);
        DeskShots.settle(model);
        String taskId = model.current().get().taskId();
        ExamSource.Task task = rated.exam().tasks().stream().filter(t -> t.id().equals(taskId)).findFirst().orElseThrow();
        String promptFile = Files.readString(rated.exam().folder().resolve(task.promptFile()));
        assertEquals(promptFile, robot.lookup("#taskPrompt").queryAs(TextArea.class).getText());
        assertTrue(robot.lookup("#taskPrompt").query().isVisible());
        List<String> shown = robot.lookup((java.util.function.Predicate<Node>) n -> n instanceof Label l && l.isVisible())
                .<Label>queryAll().stream().map(Label::getText).toList();
        for (ExamSource.Criterion c : rated.exam().rubric().criteria()) {
            for (ExamSource.Band b : c.bands()) {
                assertTrue(shown.contains(b.descriptor()), "band descriptor shown: " + b.descriptor());
            }
        }
    }

    @Test
    void desk_longTaskName_wrapsAndIsWholeInTheTooltips(FxRobot robot) throws Exception {
        InMemoryRatingDesk desk = new InMemoryRatingDesk(DeskWindowTest.demoRubric())
                .rater("rater-a", "Rater A (invented)")
                .response(new InMemoryRatingDesk.Hidden("R-L0NG", LONG_TASK, LONG_TITLE, "An invented response.",
                        "H1001", "B1", "F01", "with-resources"))
                .prompt(LONG_TASK, "Write to the harbour office (invented prompt).");
        desk.assign("rater-a", "R-L0NG", Kind.RATING);
        DeskModel model = new DeskModel(desk);
        open.add(model);
        robot.interact(() -> DeskWindow.show(stage, model));
        DeskShots.settle(model);
        robot.type(KeyCode.ENTER);
        DeskShots.settle(model);
        assertEquals("Write to the harbour office (invented prompt).",
                robot.lookup("#taskPrompt").queryAs(TextArea.class).getText());
        Label task = robot.lookup("#itemTask").queryAs(Label.class);
        assertTrue(task.isWrapText(), "the task line wraps instead of cutting the name off");
        assertTrue(task.getText().contains(LONG_TITLE), task.getText());
        assertNotNull(task.getTooltip());
        assertTrue(task.getTooltip().getText().contains(LONG_TITLE));
        Node queue = robot.lookup("#queue").query();
        ListCell<?> cell = robot.from(queue).lookup((java.util.function.Predicate<Node>) n ->
                n instanceof ListCell<?> c && c.getItem() instanceof RatingDesk.QueueItem).queryAs(ListCell.class);
        assertTrue(cell.isWrapText());
        assertTrue(cell.getTooltip().getText().contains(LONG_TASK), cell.getTooltip().getText());
        assertTrue(cell.getText().contains(LONG_TASK), "the whole id is in the entry, wrapped: " + cell.getText());
    }
}
