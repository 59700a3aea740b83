package org.inkgate.client.testutil;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.Pane;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** The layout assertion itself: each kind of problem it names, planted in a small scene, and a scene that fits. */
@ExtendWith(ApplicationExtension.class)
class LayoutCheckTest {

    private Stage stage;
    private StageSize before;

    @Start
    void start(Stage primary) {
        stage = primary;
        before = StageSize.set(primary, 400, 300);
    }

    @AfterEach
    void restore(FxRobot robot) {
        robot.interact(before::restore);
    }

    private List<String> check(FxRobot robot, Parent root, double w, double h) {
        AtomicReference<List<String>> found = new AtomicReference<>();
        robot.interact(() -> {
            // the window is the planted scene's size, whatever an earlier test left on the shared stage
            StageSize.apply(stage, w, h);
            stage.setScene(new Scene(root, w, h));
            stage.show();
            found.set(LayoutCheck.problems(stage.getScene()));
        });
        return found.get();
    }

    @Test
    void problems_buttonPastTheWindowEdge_isCutOff(FxRobot robot) {
        Button b = new Button("Look up");
        b.setId("late");
        b.relocate(350, 10);
        List<String> found = check(robot, new Pane(b), 400, 100);
        assertEquals(1, found.size(), found.toString());
        assertTrue(found.get(0).contains("#late") && found.get(0).contains("cut off"), found.get(0));
    }

    @Test
    void problems_buttonTooNarrowForItsText_isShortened(FxRobot robot) {
        Button b = new Button("_Insert into answer");
        b.setMnemonicParsing(true);
        b.setMaxWidth(60);
        b.setPrefWidth(60);
        List<String> found = check(robot, new VBox(b), 400, 100);
        assertEquals(1, found.size(), found.toString());
        assertTrue(found.get(0).contains("instead of \"Insert into answer\""), found.get(0));
    }

    @Test
    void problems_defaultButtonBelowTheFold_isReportedButOtherControlsMayScroll(FxRobot robot) {
        Region tall = new Region();
        tall.setMinHeight(500);
        Button plain = new Button("Exit");
        Button go = new Button("Continue");
        go.setId("go");
        go.setDefaultButton(true);
        ScrollPane scroller = new ScrollPane(new VBox(tall, plain, go));
        List<String> found = check(robot, scroller, 400, 200);
        assertEquals(1, found.size(), found.toString());
        assertTrue(found.get(0).contains("#go") && found.get(0).contains("below the fold"), found.get(0));
    }

    @Test
    void problems_listSqueezedUnderTwoRows_isReported(FxRobot robot) {
        ListView<String> list = new ListView<>();
        list.getItems().addAll("one", "two", "three");
        list.setPrefHeight(20);
        list.setMinHeight(20);
        list.setMaxHeight(20);
        List<String> found = check(robot, new VBox(list), 400, 200);
        assertTrue(found.stream().anyMatch(p -> p.contains("at least two")), found.toString());
    }

    @Test
    void problems_listRowWiderThanTheList_isReported(FxRobot robot) {
        ListView<String> list = new ListView<>();
        list.setId("terms");
        list.getItems().addAll("gangway [en]  \u2192 a long equivalent that needs more room than the list has [es]", "two");
        list.setMaxWidth(200);
        List<String> found = check(robot, new VBox(list), 400, 200);
        assertTrue(found.stream().anyMatch(p -> p.contains("#terms") && p.contains("runs past the list's side")), found.toString());
    }

    @Test
    void problems_wrappedLabelNarrowerThanAWord_isReported(FxRobot robot) {
        Label l = new Label("A note to a neighbour");
        l.setWrapText(true);
        l.setStyle("-fx-font-size: 40px;");
        l.setMaxWidth(90);
        l.setMinHeight(Region.USE_PREF_SIZE);
        List<String> found = check(robot, new VBox(l), 400, 400);
        assertTrue(found.stream().anyMatch(p -> p.contains("breaks the word \"neighbour\"")), found.toString());
    }

    @Test
    void problems_sceneThatFits_isEmpty(FxRobot robot) {
        Label l = new Label("A note to a neighbour");
        l.setWrapText(true);
        ListView<String> list = new ListView<>();
        list.getItems().addAll("one", "two", "three");
        list.setPrefHeight(120);
        Button go = new Button("Continue");
        go.setDefaultButton(true);
        assertEquals(List.of(), check(robot, new VBox(8, l, list, go), 400, 300));
    }
}
