package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import javafx.scene.Scene;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.RatingDesk.Kind;
import org.inkgate.admin.core.rating.RatingDesk.QueueItem;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.rating.RatingStore;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The desk over a real results store file (RatingStore), made from the invented demo exam
 * and simulated packages ({@link RatedStore}). The demo rubric (src/demo/exam-source/rubric.yaml)
 * scores both criteria 1-9. Expected values are what the test types or submits.
 */
@ExtendWith(ApplicationExtension.class)
class DeskOverStoreTest {

    private static final List<String> RATERS = List.of("rater-a", "rater-b", "rater-c");

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
    void desk_abandonedMidResponseWithoutClosing_newDeskOnTheSameFileResumesWithTheDraft(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir, RATERS);
        DeskModel first = desk(robot, rated.open());
        signIn(robot, first, "rater-a");
        String firstItem = first.current().get().blindId();
        robot.write("6").type(KeyCode.ENTER).write("5");
        submit(robot, first);
        String secondItem = first.current().get().blindId();
        robot.write("7").type(KeyCode.ENTER).type(KeyCode.ENTER).write("Left mid-way");
        DeskShots.settle(first);

        // no close, no flush: the first desk and its store connection are simply abandoned, as after a
        // crash; a second desk opens the same file through a second connection
        DeskModel second = desk(robot, rated.open());
        signIn(robot, second, "rater-a");
        assertEquals(secondItem, second.current().get().blindId(), "resumes on the response left unfinished");
        assertEquals("7", robot.lookup("#score-task-fulfilment").queryAs(TextField.class).getText());
        assertEquals("", robot.lookup("#score-language-control").queryAs(TextField.class).getText());
        assertEquals("Left mid-way", robot.lookup("#comment").queryAs(TextArea.class).getText());
        try (RatingStore check = rated.open()) {
            assertEquals(Optional.of(new RatingSheet(Map.of("task-fulfilment", 6, "language-control", 5), "")),
                    check.submitted("rater-a", firstItem));
            assertTrue(check.submitted("rater-a", secondItem).isEmpty(), "the unfinished one is a draft only");
            assertEquals(1, check.progress("rater-a").rated());
        }
    }

    @Test
    void desk_flaggedResponse_reachesTheThirdRaterAsAnAdjudicationAndShowsNothingThatIdentifies(FxRobot robot)
            throws Exception {
        RatedStore rated = RatedStore.make(dir, RATERS);
        RatingStore setup = rated.open();
        open.add(setup);
        // totals more than 2 apart are flagged (a threshold chosen for the test, the test owner's in real use)
        setup.setRule(new DiscrepancyRule(null, 2, DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN));
        // rater-b scores everything 9/9 and rater-c 1/1, so every response the two share disagrees by 16
        for (String rater : List.of("rater-b", "rater-c")) {
            int s = rater.equals("rater-b") ? 9 : 1;
            for (QueueItem q : setup.queue(rater)) {
                setup.submit(rater, q.blindId(), new RatingSheet(Map.of("task-fulfilment", s, "language-control", s), ""));
            }
        }
        List<QueueItem> adjudications = setup.queue("rater-a").stream().filter(q -> q.kind() == Kind.ADJUDICATION).toList();
        assertFalse(adjudications.isEmpty(), "rater-a adjudicates what rater-b and rater-c disagreed on");

        DeskModel desk = desk(robot, rated.open());
        BlindnessScan scan = BlindnessScan.forDemoExam(rated.hiddenFacts());
        Scene scene = stage.getScene();
        scan.check(scene, "sign-in");
        signIn(robot, desk, "rater-a");
        // rater-a's own ratings come first in the queue; adjudications after them
        QueueItem firstOwn = desk.current().get();
        assertEquals(Kind.RATING, firstOwn.kind());
        assertFalse(robot.lookup("#itemKind").query().isVisible());
        scan.check(scene, "rating " + firstOwn.blindId());
        robot.interact(() -> desk.open(adjudications.get(0)));
        DeskShots.settle(desk);
        assertEquals(adjudications.get(0).blindId(), desk.current().get().blindId());
        assertTrue(robot.lookup("#itemKind").query().isVisible(), "labelled as an adjudication");
        assertEquals("", robot.lookup("#score-task-fulfilment").queryAs(TextField.class).getText(),
                "no earlier rating is filled in");
        scan.check(scene, "adjudication " + adjudications.get(0).blindId());
        robot.clickOn("#score-task-fulfilment").write("4").type(KeyCode.ENTER).write("3");
        submit(robot, desk);
        assertEquals(Optional.of(new RatingSheet(Map.of("task-fulfilment", 4, "language-control", 3), "")),
                setup.submitted("rater-a", adjudications.get(0).blindId()));
        assertTrue(setup.flags().stream().anyMatch(f -> adjudications.get(0).blindId().equals(f.adjudicatorBlindId())
                && f.adjudicated()), "the store counts the flag as adjudicated: " + setup.flags());
        assertTrue(scan.textsSeen() > 20, "the scan read the screens' text");
    }

    private DeskModel desk(FxRobot robot, RatingStore store) throws Exception {
        open.add(store);
        DeskModel model = new DeskModel(store);
        open.add(model);
        robot.interact(() -> DeskWindow.show(stage, model));
        DeskShots.settle(model);
        return model;
    }

    /** Signs in by keyboard: arrows to the rater's row in the list, then Enter. */
    private static void signIn(FxRobot robot, DeskModel model, String raterId) throws Exception {
        int index = -1;
        for (int i = 0; i < model.raters().size(); i++) {
            if (model.raters().get(i).id().equals(raterId)) {
                index = i;
            }
        }
        assertTrue(index >= 0, raterId + " in " + model.raters());
        for (int i = 0; i < index; i++) {
            robot.type(KeyCode.DOWN);
        }
        robot.type(KeyCode.ENTER);
        DeskShots.settle(model);
        assertEquals(raterId, model.rater().get().id());
    }

    private static void submit(FxRobot robot, DeskModel model) throws Exception {
        robot.press(KeyCode.CONTROL).type(KeyCode.ENTER).release(KeyCode.CONTROL);
        DeskShots.settle(model);
    }
}
