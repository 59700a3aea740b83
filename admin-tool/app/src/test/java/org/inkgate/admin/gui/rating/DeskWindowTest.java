package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.RatingDesk.Kind;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Drives the rating desk headless (Monocle) by keyboard, over an in-memory double of the
 * RatingDesk contract holding invented responses and the invented demo rubric
 * (src/demo/exam-source/rubric.yaml: two criteria scored 1-9, bands 1-3, 4-6, 7-9). Expected
 * values are what the test types and what that rubric file says, never what the desk computes.
 */
@ExtendWith(ApplicationExtension.class)
class DeskWindowTest {

    private Stage stage;
    private DeskModel model;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @AfterEach
    void closeModel(FxRobot robot) {
        robot.interact(() -> stage.hide());
        if (model != null) {
            model.close();
        }
    }

    static ExamSource.Rubric demoRubric() throws Exception {
        return ExamSourceReader.read(DemoSource.DEMO.resolve("exam-source")).rubric();
    }

    /** Three responses for rater-a, and rater-b with one rating and one adjudication; all invented. */
    static InMemoryRatingDesk fixture() throws Exception {
        InMemoryRatingDesk desk = new InMemoryRatingDesk(demoRubric())
                .rater("rater-a", "Rater A (invented)")
                .rater("rater-b", "Rater B (invented)")
                .response(new InMemoryRatingDesk.Hidden("R-K7P2", "ferry-complaint", "A message about the ferry timetable",
                        "Dear harbour office,\n\nThe new timetable leaves no boat between nine and eleven, so the"
                                + " morning market is hard to reach. Could one crossing at ten come back?\n\nKind regards",
                        "H1001", "B1", "F01", "with-resources"))
                .response(new InMemoryRatingDesk.Hidden("R-M3X9", "ferry-complaint", "A message about the ferry timetable",
                        "Hello,\n\nI write about the ferry. The last boat now goes at six and I finish work at six."
                                + " Please think about a later boat for people who work in town.",
                        "H1002", "B2", "F02", "without-resources"))
                .response(new InMemoryRatingDesk.Hidden("R-Q8D4", "market-square", "Cars in the market square",
                        "Closing the square to cars on market days would make it safer for children, but the"
                                + " shop owners need deliveries early in the morning.",
                        "H1003", "B1", "F03", "without-resources"))
                .response(new InMemoryRatingDesk.Hidden("R-V5N1", "ferry-complaint", "A message about the ferry timetable",
                        "To whom it may concern, the ferry timetable is a problem for my family because the"
                                + " school boat leaves before the bus arrives.",
                        "H1004", "B2", "F04", "with-resources"));
        // the demo's own prompt files (src/demo/exam-source/prompts)
        ExamSource demo = ExamSourceReader.read(DemoSource.DEMO.resolve("exam-source"));
        for (ExamSource.Task t : demo.tasks()) {
            desk.prompt(t.id(), java.nio.file.Files.readString(demo.folder().resolve(t.promptFile())));
        }
        desk.assign("rater-a", "R-K7P2", Kind.RATING).assign("rater-a", "R-M3X9", Kind.RATING)
                .assign("rater-a", "R-Q8D4", Kind.RATING);
        desk.assign("rater-b", "R-M3X9", Kind.RATING).assign("rater-b", "R-V5N1", Kind.ADJUDICATION);
        return desk;
    }

    @Test
    void desk_queueScoredByKeyboardOnly_everyRatingSubmittedAsTyped(FxRobot robot) throws Exception {
        InMemoryRatingDesk desk = fixture();
        Scene scene = show(robot, desk);
        DeskShots.shoot(robot, scene, "rating-desk-sign-in.png");

        robot.type(KeyCode.ENTER); // rater-a is first in the list and selected
        settle(robot);
        assertEquals("R-K7P2", model.current().get().blindId(), "the first response of the queue opens");

        // the typed scores: task fulfilment 5, language control 7 (both 1-9 in rubric.yaml)
        robot.write("5");
        settle(robot);
        // rubric.yaml: the band 4-6 of task fulfilment covers 5
        assertEquals(List.of("4\u20136"), currentBands(robot, "task-fulfilment"));
        robot.type(KeyCode.ENTER).write("7").type(KeyCode.ENTER).write("Clear request; one point repeated.");
        settle(robot);
        assertEquals(List.of("7\u20139"), currentBands(robot, "language-control"));
        DeskShots.shoot(robot, scene, "rating-desk-scoring.png");
        submitByKeyboard(robot);
        assertEquals(Optional.of(new RatingSheet(Map.of("task-fulfilment", 5, "language-control", 7),
                "Clear request; one point repeated.")), desk.submitted("rater-a", "R-K7P2"));
        assertEquals("R-M3X9", model.current().get().blindId(), "save and next opens the next response");
        assertEquals("Rated 1 of 3  \u00b7  2 remaining  \u00b7  0 flagged", label(robot, "#progressText"));

        // arrows: Up from empty starts at the lowest score (1), Up again 2; Down from 2 is 1 and stays 1 at the bottom
        robot.type(KeyCode.UP).type(KeyCode.UP);
        settle(robot);
        assertEquals("2", field(robot, "task-fulfilment").getText());
        robot.type(KeyCode.DOWN).type(KeyCode.DOWN);
        settle(robot);
        assertEquals("1", field(robot, "task-fulfilment").getText());
        // Tab also moves on (the issue asks for digits with Tab or Enter)
        robot.type(KeyCode.TAB).write("3");
        submitByKeyboard(robot);
        assertEquals(Map.of("task-fulfilment", 1, "language-control", 3),
                desk.submitted("rater-a", "R-M3X9").orElseThrow().scores());

        robot.write("9").type(KeyCode.ENTER).write("8");
        submitByKeyboard(robot);
        assertEquals(Map.of("task-fulfilment", 9, "language-control", 8),
                desk.submitted("rater-a", "R-Q8D4").orElseThrow().scores());

        assertTrue(model.finished().get(), "all three submitted");
        assertTrue(robot.lookup("#finishedPane").query().isVisible());
        assertTrue(label(robot, "#finishedText").startsWith("You have submitted all 3 ratings"), label(robot, "#finishedText"));
        assertEquals("Rated 3 of 3  \u00b7  0 remaining  \u00b7  0 flagged", label(robot, "#progressText"));
        assertEquals(3, desk.history().size(), "one submission per response: " + desk.history());
        DeskShots.shoot(robot, scene, "rating-desk-finished.png");
    }

    @Test
    void desk_closedWithoutSubmitting_reopensOnTheSameResponseWithTheDraft(FxRobot robot) throws Exception {
        InMemoryRatingDesk desk = fixture();
        show(robot, desk);
        robot.type(KeyCode.ENTER);
        settle(robot);
        robot.write("6").type(KeyCode.ENTER).write("4").type(KeyCode.ENTER);
        submitByKeyboard(robot);
        // the second response: one score and half a comment, then the window goes away without submitting
        robot.write("8").type(KeyCode.ENTER).type(KeyCode.ENTER).write("Stopped halfway");
        settle(robot);
        assertEquals(Optional.of(new RatingSheet(Map.of("task-fulfilment", 8), "Stopped halfway")),
                desk.draft("rater-a", "R-M3X9"), "the draft is in the store before the window closes");
        robot.interact(() -> stage.hide());
        model.close();
        assertTrue(desk.submitted("rater-a", "R-M3X9").isEmpty(), "nothing was submitted by closing");

        show(robot, desk);
        robot.type(KeyCode.ENTER);
        settle(robot);
        assertEquals("R-M3X9", model.current().get().blindId(), "resumes on the response the rater had not finished");
        assertEquals("8", field(robot, "task-fulfilment").getText());
        assertEquals("", field(robot, "language-control").getText());
        assertEquals("Stopped halfway", robot.lookup("#comment").queryAs(TextArea.class).getText());
        assertTrue(label(robot, "#deskStatus").contains("draft"), label(robot, "#deskStatus"));
        // finish it: focus is on the first score field; go to the missing one
        robot.type(KeyCode.ENTER).write("5");
        submitByKeyboard(robot);
        assertEquals(Optional.of(new RatingSheet(Map.of("task-fulfilment", 8, "language-control", 5), "Stopped halfway")),
                desk.submitted("rater-a", "R-M3X9"));
    }

    @Test
    void scoreField_outOfRangeOrNotADigit_refusedWithAMessageAndNothingSubmitted(FxRobot robot) throws Exception {
        InMemoryRatingDesk desk = fixture();
        show(robot, desk);
        robot.type(KeyCode.ENTER);
        settle(robot);
        // rubric.yaml: task fulfilment takes 1-9, so after "1" the "2" (making 12) is refused
        robot.write("1").write("2");
        settle(robot);
        assertEquals("1", field(robot, "task-fulfilment").getText());
        assertEquals("12 is outside Task fulfilment: scores run from 1 to 9.", label(robot, "#message-task-fulfilment"));
        robot.type(KeyCode.BACK_SPACE).write("0");
        settle(robot);
        assertEquals("", field(robot, "task-fulfilment").getText(), "0 is below the range and begins no score");
        robot.write("x");
        settle(robot);
        assertTrue(label(robot, "#message-task-fulfilment").startsWith("Task fulfilment takes whole numbers only"),
                label(robot, "#message-task-fulfilment"));
        robot.write("4");
        settle(robot);
        assertFalse(robot.lookup("#message-task-fulfilment").query().isVisible(), "a valid score clears the message");

        // language control left empty: save and next refuses, names it, and keeps the rater on this response
        submitByKeyboard(robot);
        assertTrue(label(robot, "#problem").contains("Missing: Language control"), label(robot, "#problem"));
        assertTrue(field(robot, "language-control").isFocused(), "focus goes to the criterion without a score");
        assertTrue(desk.history().isEmpty(), "nothing submitted");
        assertEquals("R-K7P2", model.current().get().blindId());
        assertEquals(Optional.of(new RatingSheet(Map.of("task-fulfilment", 4), "")), desk.draft("rater-a", "R-K7P2"),
                "refused keystrokes never reach the draft");
    }

    @Test
    void desk_adjudicationItem_isLabelledAndStaysBlind(FxRobot robot) throws Exception {
        InMemoryRatingDesk desk = fixture();
        Scene scene = show(robot, desk);
        robot.type(KeyCode.DOWN).type(KeyCode.ENTER); // rater-b
        settle(robot);
        assertEquals("R-M3X9", model.current().get().blindId());
        assertFalse(robot.lookup("#itemKind").query().isVisible(), "a first rating is not labelled adjudication");
        robot.write("4").type(KeyCode.ENTER).write("4");
        submitByKeyboard(robot);
        assertEquals("R-V5N1", model.current().get().blindId());
        assertTrue(robot.lookup("#itemKind").query().isVisible());
        assertEquals(ScoringView.ADJUDICATION_NOTE, label(robot, "#itemKind"));
        // the earlier ratings of the response are not on screen: nothing rater-a or rater-b typed elsewhere shows
        assertEquals("", field(robot, "task-fulfilment").getText());
        assertEquals("", field(robot, "language-control").getText());
        robot.write("3").type(KeyCode.ENTER).write("2");
        settle(robot);
        DeskShots.shoot(robot, scene, "rating-desk-adjudication.png");
        submitByKeyboard(robot);
        assertEquals(Map.of("task-fulfilment", 3, "language-control", 2),
                desk.submitted("rater-b", "R-V5N1").orElseThrow().scores());
        assertTrue(model.finished().get());
    }

    @Test
    void everyScreen_showsNoCandidateLevelFormConditionOrTool(FxRobot robot) throws Exception {
        InMemoryRatingDesk desk = fixture();
        Scene scene = show(robot, desk);
        BlindnessScan scan = BlindnessScan.forDemoExam(desk.hidden().stream()
                .flatMap(h -> java.util.stream.Stream.of(h.candidate(), h.level(), h.form(), h.condition())).toList());
        scan.check(scene, "sign-in");
        robot.type(KeyCode.ENTER);
        settle(robot);
        for (int i = 0; i < 3; i++) {
            scan.check(scene, "response " + model.current().get().blindId());
            robot.write("5").type(KeyCode.ENTER).write("5");
            submitByKeyboard(robot);
        }
        scan.check(scene, "queue finished");
        robot.interact(() -> robot.lookup("#signOut").queryButton().fire());
        settle(robot);
        robot.type(KeyCode.DOWN).type(KeyCode.ENTER);
        settle(robot);
        robot.write("5").type(KeyCode.ENTER).write("5");
        submitByKeyboard(robot);
        scan.check(scene, "adjudication " + model.current().get().blindId());
        assertTrue(scan.textsSeen() > 20, "the scan read the screens' text: " + scan.textsSeen());
    }

    @Test
    void desk_tabAndShiftTab_reachEveryControlInOrderAndNeverStickInATextBox(FxRobot robot) throws Exception {
        show(robot, fixture());
        robot.type(KeyCode.ENTER);
        settle(robot);
        List<String> forward = new java.util.ArrayList<>();
        for (int i = 0; i < 3; i++) {
            robot.type(KeyCode.TAB);
            settle(robot);
            forward.add(focusId());
        }
        // from the first score: the second score, the comment (Tab leaves it instead of typing a tab), the button
        assertEquals(List.of("score-language-control", "comment", "saveNext"), forward);
        robot.interact(() -> robot.lookup("#comment").query().requestFocus());
        robot.press(KeyCode.SHIFT).type(KeyCode.TAB).release(KeyCode.SHIFT);
        settle(robot);
        assertEquals("score-language-control", focusId(), "Shift+Tab leaves the comment backwards");
        robot.interact(() -> robot.lookup("#responseText").query().requestFocus());
        robot.type(KeyCode.TAB);
        settle(robot);
        assertEquals("score-task-fulfilment", focusId(), "Tab leaves the read-only response for the first score");
        assertEquals("", model.comment().get(), "no tab character was typed anywhere");
    }

    @Test
    void desk_everyInputAndList_hasAnAccessibleName(FxRobot robot) throws Exception {
        Scene scene = show(robot, fixture());
        robot.type(KeyCode.ENTER);
        settle(robot);
        int inputs = 0;
        for (Node n : robot.from(scene.getRoot()).lookup((java.util.function.Predicate<Node>) n ->
                n instanceof javafx.scene.control.TextInputControl || n instanceof javafx.scene.control.ListView
                        || n instanceof javafx.scene.control.ProgressBar).queryAll()) {
            assertTrue(n.getAccessibleText() != null && !n.getAccessibleText().isBlank(), n + " has no accessible name");
            inputs++;
        }
        assertTrue(inputs >= 5, "queue, response, two scores, comment, progress: " + inputs);
    }

    private String focusId() throws Exception {
        AtomicReference<String> id = new AtomicReference<>();
        org.testfx.util.WaitForAsyncUtils.asyncFx(() -> {
            Node owner = stage.getScene().getFocusOwner();
            id.set(owner == null ? null : owner.getId());
        }).get();
        return id.get();
    }

    // ---- helpers

    private Scene show(FxRobot robot, InMemoryRatingDesk desk) throws Exception {
        model = new DeskModel(desk);
        AtomicReference<Scene> scene = new AtomicReference<>();
        robot.interact(() -> scene.set(DeskWindow.show(stage, model)));
        settle(robot);
        return scene.get();
    }

    private void submitByKeyboard(FxRobot robot) throws Exception {
        robot.press(KeyCode.CONTROL).type(KeyCode.ENTER).release(KeyCode.CONTROL);
        settle(robot);
    }

    private void settle(FxRobot robot) throws Exception {
        DeskShots.settle(model);
    }

    private static TextField field(FxRobot robot, String criterion) {
        return robot.lookup("#score-" + criterion).queryAs(TextField.class);
    }

    private static String label(FxRobot robot, String query) {
        Node node = robot.lookup(query).query();
        return ((Label) node).getText();
    }

    /** The band labels (e.g. "4-6") marked as covering the score, for one criterion. */
    private static List<String> currentBands(FxRobot robot, String criterion) {
        Node card = robot.lookup("#score-" + criterion).query().getParent().getParent();
        return robot.from(card).lookup(".band-current").queryAll().stream()
                .map(n -> ((Label) ((javafx.scene.layout.HBox) n).getChildren().get(0)).getText()).toList();
    }
}
