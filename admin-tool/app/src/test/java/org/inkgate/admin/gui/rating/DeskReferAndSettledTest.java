package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextArea;
import javafx.scene.control.TitledPane;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.DiscrepancyRule;
import org.inkgate.admin.core.rating.RatingDesk.Kind;
import org.inkgate.admin.core.rating.RatingDesk.QueueItem;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.rating.Referrals;
import org.inkgate.admin.core.rating.RatingStore;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Issue 15 §3 in the desk over a real results store ({@link RatedStore}): a rater refers the open
 * script with a reason and a note, which the test owner's list shows; and a rating for a response
 * the test owner settled meanwhile is refused with the reason, while the response leaves the queue.
 */
@ExtendWith(ApplicationExtension.class)
class DeskReferAndSettledTest {

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
    @SuppressWarnings("unchecked")
    void refer_openScript_reachesTheTestOwnersListWithReasonAndNote(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir, RATERS);
        DeskModel desk = desk(robot, rated.open());
        signIn(robot, desk);
        String blind = desk.current().get().blindId();
        robot.interact(() -> robot.lookup("#referPane").queryAs(TitledPane.class).setExpanded(true));
        robot.interact(() -> robot.lookup("#sendReferral").queryButton().fire());
        DeskShots.settle(desk);
        assertTrue(robot.lookup("#problem").queryAs(Label.class).getText().startsWith("Not referred yet"),
                "a reason and a note are needed");
        robot.interact(() -> ((ChoiceBox<Referrals.Reason>) robot.lookup("#referReason").queryAs(ChoiceBox.class))
                .setValue(Referrals.Reason.OFF_TASK));
        robot.interact(() -> robot.lookup("#referNote").queryAs(TextArea.class).setText("writes a recipe instead"));
        robot.interact(() -> robot.lookup("#sendReferral").queryButton().fire());
        DeskShots.settle(desk);
        assertTrue(robot.lookup("#deskStatus").queryAs(Label.class).getText().contains("referred to the test owner"),
                robot.lookup("#deskStatus").queryAs(Label.class).getText());
        assertEquals(blind, desk.current().get().blindId(), "the script stays open in the queue");
        try (RatingStore owner = rated.open()) {
            List<Referrals.Referral> list = owner.referrals(true);
            assertEquals(1, list.size());
            assertEquals(blind, list.get(0).blindId());
            assertEquals("rater-a", list.get(0).raterId());
            assertEquals(Referrals.Reason.OFF_TASK, list.get(0).reason());
            assertEquals("writes a recipe instead", list.get(0).note());
        }
        assertTrue(robot.lookup("#referReason").queryAs(ChoiceBox.class).getAccessibleText() != null);
    }

    @Test
    void settledWhileOpen_submitIsRefusedWithTheReason_andTheResponseLeavesTheQueue(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir, RATERS);
        RatingStore owner = rated.open();
        open.add(owner);
        owner.setRule(new DiscrepancyRule(null, 2, DiscrepancyRule.AdjudicatedScore.CLOSEST_PAIR_MEAN));
        for (String rater : List.of("rater-b", "rater-c")) {
            int s = rater.equals("rater-b") ? 9 : 1;
            for (QueueItem q : owner.queue(rater)) {
                owner.submit(rater, q.blindId(), new RatingSheet(Map.of("task-fulfilment", s, "language-control", s), ""));
            }
        }
        QueueItem adjudication = owner.queue("rater-a").stream().filter(q -> q.kind() == Kind.ADJUDICATION).findFirst()
                .orElseThrow();
        DeskModel desk = desk(robot, rated.open());
        signIn(robot, desk);
        int before = desk.queue().size();
        robot.interact(() -> desk.open(adjudication));
        DeskShots.settle(desk);
        RatingStore.Flag flag = owner.flags().stream()
                .filter(f -> adjudication.blindId().equals(f.adjudicatorBlindId())).findFirst().orElseThrow();
        owner.resolve(flag.flagId(), "Invented panel lead", Map.of("task-fulfilment", 5, "language-control", 5), "");

        robot.clickOn("#score-task-fulfilment").write("4").type(KeyCode.ENTER).write("3");
        robot.press(KeyCode.CONTROL).type(KeyCode.ENTER).release(KeyCode.CONTROL);
        DeskShots.settle(desk);
        String problem = robot.lookup("#problem").queryAs(Label.class).getText();
        assertTrue(problem.contains("settled by the test owner's resolution entry"), problem);
        assertTrue(owner.submitted("rater-a", adjudication.blindId()).isEmpty(), "nothing stored");
        signOutAndIn(robot, desk);
        assertEquals(before - 1, desk.queue().size(), "the settled response left the queue");
        assertFalse(desk.queue().stream().anyMatch(q -> q.blindId().equals(adjudication.blindId())));
    }

    private DeskModel desk(FxRobot robot, RatingStore store) throws Exception {
        open.add(store);
        DeskModel model = new DeskModel(store);
        open.add(model);
        robot.interact(() -> DeskWindow.show(stage, model));
        DeskShots.settle(model);
        return model;
    }

    /** rater-a is the first rater in the list: Enter signs in. */
    private static void signIn(FxRobot robot, DeskModel model) throws Exception {
        robot.type(KeyCode.ENTER);
        DeskShots.settle(model);
        assertEquals("rater-a", model.rater().get().id());
    }

    private static void signOutAndIn(FxRobot robot, DeskModel model) throws Exception {
        robot.interact(model::signOut);
        DeskShots.settle(model);
        robot.interact(() -> model.signIn(model.raters().get(0)));
        DeskShots.settle(model);
    }
}
