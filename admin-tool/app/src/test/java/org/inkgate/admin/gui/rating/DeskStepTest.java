package org.inkgate.admin.gui.rating;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TextInputControl;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.AdminWindow;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The admin window's rating step opens the desk in its own window over a real results store. */
@ExtendWith(ApplicationExtension.class)
class DeskStepTest {

    @TempDir
    Path dir;
    private Stage stage;

    @Start
    void start(Stage primary) {
        this.stage = primary;
    }

    @Test
    void ratingStep_storeWithRaters_opensTheDeskWindowWithTheRaters(FxRobot robot) throws Exception {
        RatedStore rated = RatedStore.make(dir, List.of("rater-a", "rater-b", "rater-c"));
        AdminSession session = new AdminSession();
        javafx.scene.Scene[] admin = new javafx.scene.Scene[1];
        robot.interact(() -> admin[0] = AdminWindow.show(stage, session));
        robot.press(KeyCode.CONTROL, KeyCode.DIGIT6).release(KeyCode.DIGIT6, KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(5, robot.lookup("#steps").queryListView().getSelectionModel().getSelectedIndex(), "Ctrl+6: step 6");
        robot.interact(() -> robot.lookup("#deskStore").queryAs(TextInputControl.class).setText(rated.file().toString()));
        robot.interact(() -> robot.lookup("#openDesk").queryButton().fire());
        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> desk() != null);
        WaitForAsyncUtils.waitForFxEvents();
        Stage desk = desk();
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> !raters(robot, desk).getItems().isEmpty());
        assertEquals(List.of("rater-a", "rater-b", "rater-c"), raters(robot, desk).getItems().stream()
                .map(r -> ((org.inkgate.admin.core.rating.RatingDesk.Rater) r).id()).toList());
        assertTrue(((Label) robot.lookup("#deskResult").query()).getText().startsWith("The rating desk is open"));
        for (javafx.scene.Node n : robot.from(admin[0].getRoot()).lookup(".step").lookup((java.util.function.Predicate<javafx.scene.Node>)
                n -> n instanceof TextInputControl).queryAll()) {
            assertTrue(n.getAccessibleText() != null && !n.getAccessibleText().isBlank(), n + " has no accessible name");
        }
        robot.interact(desk::close);
        DeskShots.shoot(robot, admin[0], "admin-rating-desk.png");
    }

    @Test
    void ratingStep_noStore_saysWhatToDo(FxRobot robot) {
        AdminSession session = new AdminSession();
        robot.interact(() -> AdminWindow.show(stage, session));
        robot.interact(() -> robot.lookup("#steps").queryListView().getSelectionModel().select(5));
        robot.interact(() -> robot.lookup("#deskStore").queryAs(TextInputControl.class).setText(dir.resolve("none.db").toString()));
        robot.interact(() -> robot.lookup("#openDesk").queryButton().fire());
        String result = ((Label) robot.lookup("#deskResult").query()).getText();
        assertTrue(result.startsWith("There is no results store at "), result);
        assertTrue(desk() == null, "no desk window");
    }

    private static Stage desk() {
        return Window.getWindows().stream().filter(w -> w instanceof Stage s && DeskWindow.TITLE.equals(s.getTitle()))
                .map(Stage.class::cast).findFirst().orElse(null);
    }

    private static ListView<?> raters(FxRobot robot, Stage desk) {
        return robot.from(desk.getScene().getRoot()).lookup("#raters").queryListView();
    }
}
