package org.inkgate.client.practice.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.TextArea;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.client.practice.PracticeLoader;
import org.inkgate.client.testutil.DemoBundles;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

@ExtendWith(ApplicationExtension.class)
class PracticeWindowTest {

    static final String TITLE = "Everyday Writing: Practice Paper (invented demo)";
    static final String NOTE = "A note to a neighbour";
    static final String SHOP = "The empty shop on Mill Street";

    @TempDir
    static Path temp;
    private static Path demoBundle;
    private Stage stage;

    @BeforeAll
    static void buildDemoBundle() throws Exception {
        demoBundle = DemoBundles.buildInto(temp);
    }

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @BeforeEach
    void openDemo(FxRobot robot) {
        robot.interact(() -> PracticeStage.show(stage, new PracticeLoader().load(demoBundle)));
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void show_demoBundle_showsTitlesAndPracticeBanner(FxRobot robot) {
        assertEquals("Inkgate - " + TITLE + " (practice)", stage.getTitle());
        assertEquals(TITLE, robot.lookup("#examTitle").queryAs(Label.class).getText());
        String banner = robot.lookup("#practiceBanner").query().getAccessibleText();
        assertTrue(banner.startsWith("Practice mode: this machine is not locked and nothing is submitted."), banner);
        assertTrue(robot.lookup("#signerText").queryAs(Label.class).getText().matches(
                "Signed with key ([0-9a-f]{4}-){7}[0-9a-f]{4}\\..*"));
    }

    @Test
    void show_demoBundle_listsFormATasksInOrderWithFirstSelected(FxRobot robot) {
        assertEquals("Form A", formChooser(robot).getValue().name());
        assertEquals(List.of("1. " + NOTE, "2. " + SHOP), cellTexts(robot, "task-title"));
        assertEquals("Task 1 of 2: " + NOTE, text(robot, "#taskHeading"));
        assertTrue(robot.lookup("#promptText").query().getAccessibleText().contains("Sam Okafor"));
    }

    @Test
    void show_formA_listsDifferentToolsForTheTwoConditions(FxRobot robot) {
        assertEquals(List.of("With resources", "Without resources"), cellTexts(robot, "task-condition"));
        List<String> tools = cellTexts(robot, "task-tools");
        assertEquals(List.of("Spelling check with suggestions", "No writing tools in this task"), tools);
        assertNotEquals(tools.get(0), tools.get(1));
        assertEquals("Spelling check with suggestions", text(robot, "#taskTools"));
    }

    @Test
    void typing_inEditor_updatesWordCountLive(FxRobot robot) {
        assertEquals("0 words", text(robot, "#wordCount"));
        assertEquals("Aim for 80 to 120 words", text(robot, "#wordGuidance"));

        robot.clickOn("#editor").write("Dear Sam");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("2 words", text(robot, "#wordCount"));

        robot.write(", thank you!");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Dear Sam, thank you!", robot.lookup("#editor").queryAs(TextArea.class).getText());
        assertEquals("4 words", text(robot, "#wordCount"));
    }

    @Test
    void chooseForm_formB_swapsTaskOrderAndConditions(FxRobot robot) {
        robot.clickOn("#formChooser").clickOn("Form B");
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals("Form B", formChooser(robot).getValue().name());
        assertEquals(List.of("1. " + SHOP, "2. " + NOTE), cellTexts(robot, "task-title"));
        assertEquals(List.of("With resources", "Without resources"), cellTexts(robot, "task-condition"));
        assertEquals(List.of("Spelling check with suggestions", "No writing tools in this task"),
                cellTexts(robot, "task-tools"));
        assertEquals("Task 1 of 2: " + SHOP, text(robot, "#taskHeading"));
        assertEquals("Aim for 120 to 180 words", text(robot, "#wordGuidance"));
    }

    @Test
    void arrowDown_inTaskList_showsSecondTaskWithoutTools(FxRobot robot) {
        assertTrue(robot.lookup("#taskList").query().isFocused(), "the task list has focus first");
        robot.type(KeyCode.DOWN);
        WaitForAsyncUtils.waitForFxEvents();

        assertEquals("Task 2 of 2: " + SHOP, text(robot, "#taskHeading"));
        assertEquals("Without resources", text(robot, "#taskCondition"));
        assertEquals("No writing tools in this task", text(robot, "#taskTools"));
        assertTrue(robot.lookup("#promptText").query().getAccessibleText().contains("Mill Street"));
    }

    @Test
    void switchTask_afterWriting_keepsEachTasksPracticeText(FxRobot robot) {
        robot.clickOn("#editor").write("first task words");
        robot.interact(() -> taskList(robot).getSelectionModel().select(1));
        assertEquals("", robot.lookup("#editor").queryAs(TextArea.class).getText());
        assertEquals("0 words", text(robot, "#wordCount"));

        robot.interact(() -> taskList(robot).getSelectionModel().select(0));
        assertEquals("first task words", robot.lookup("#editor").queryAs(TextArea.class).getText());
        assertEquals("3 words", text(robot, "#wordCount"));
    }

    private static String text(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(Label.class).getText();
    }

    @SuppressWarnings("unchecked")
    private static ComboBox<org.inkgate.client.practice.PracticeForm> formChooser(FxRobot robot) {
        return robot.lookup("#formChooser").queryAs(ComboBox.class);
    }

    @SuppressWarnings("unchecked")
    private static ListView<org.inkgate.client.practice.PracticeTask> taskList(FxRobot robot) {
        return robot.lookup("#taskList").queryAs(ListView.class);
    }

    /** The text of one part of every shown task cell, in list order. */
    private static List<String> cellTexts(FxRobot robot, String styleClass) {
        WaitForAsyncUtils.waitForFxEvents();
        return robot.lookup(".task-cell").queryAll().stream()
                .map(node -> (ListCell<?>) node)
                .filter(cell -> !cell.isEmpty() && cell.isVisible() && cell.getParent() != null)
                .sorted(Comparator.comparingInt(ListCell::getIndex))
                .map(cell -> ((Label) cell.lookup("." + styleClass)).getText())
                .toList();
    }
}
