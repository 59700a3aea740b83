package org.inkgate.admin.gui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TextInputControl;
import javafx.stage.Stage;
import org.inkgate.admin.testutil.PngSnapshots;
import org.testfx.api.FxRobot;
import org.testfx.util.WaitForAsyncUtils;

/** Drives the admin window's steps in tests as a test owner would: by the step's name, fields by id. */
public final class StepDriver {

    private StepDriver() {
    }

    /** Selects the step whose name (without its number) is {@code name}, as a click in the step list would. */
    @SuppressWarnings("unchecked")
    public static void select(FxRobot robot, String name) {
        robot.interact(() -> {
            ListView<Step> steps = robot.lookup("#steps").queryAs(ListView.class);
            Step step = steps.getItems().stream().filter(s -> s.title().replaceFirst("^\\d+\\. ", "").equals(name))
                    .findFirst().orElseThrow(() -> new AssertionError("no step named " + name));
            steps.getSelectionModel().select(step);
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Scrolls the step until the button is in view, as a test owner would, and clicks it. */
    public static void press(FxRobot robot, String query) {
        robot.interact(() -> {
            javafx.scene.Node node = robot.lookup(query).query();
            javafx.scene.Node p = node.getParent();
            while (p != null && !(p instanceof javafx.scene.control.ScrollPane)) {
                p = p.getParent();
            }
            if (p instanceof javafx.scene.control.ScrollPane scroll && scroll.getContent() != null) {
                javafx.scene.Node content = scroll.getContent();
                double y = content.sceneToLocal(node.localToScene(node.getBoundsInLocal())).getMinY();
                double room = content.getBoundsInLocal().getHeight() - scroll.getViewportBounds().getHeight();
                if (room > 0) {
                    scroll.setVvalue(Math.max(0, Math.min(1, (y - scroll.getViewportBounds().getHeight() / 3) / room)));
                }
                scroll.layout();
            }
        });
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn(query);
    }

    /** Scrolls the step so that the node's top sits {@code above} pixels below the top of the view (for pictures). */
    public static void scrollTo(FxRobot robot, String query, double above) {
        robot.interact(() -> {
            javafx.scene.Node node = robot.lookup(query).query();
            javafx.scene.control.ScrollPane scroll = robot.lookup(".step-scroll")
                    .queryAs(javafx.scene.control.ScrollPane.class);
            scroll.layout();
            javafx.scene.Node content = scroll.getContent();
            double y = content.sceneToLocal(node.localToScene(node.getBoundsInLocal())).getMinY();
            double room = content.getBoundsInLocal().getHeight() - scroll.getViewportBounds().getHeight();
            scroll.setVvalue(room <= 0 ? 0 : Math.max(0, Math.min(1, (y - above) / room)));
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    public static void setText(FxRobot robot, String query, String text) {
        robot.interact(() -> robot.lookup(query).queryAs(TextInputControl.class).setText(text));
    }

    public static String label(FxRobot robot, String query) {
        return robot.lookup(query).queryAs(Label.class).getText();
    }

    /** Waits until the background worker is idle again. */
    public static void waitForWork(AdminSession session) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        WaitForAsyncUtils.waitFor(120, TimeUnit.SECONDS, () -> !session.work().busy().get());
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Resizes the window to 1024x768 (the smallest screen the guides promise) and saves a screenshot. */
    public static Path shoot1024(FxRobot robot, Stage stage, String name) throws Exception {
        robot.interact(() -> {
            stage.setWidth(1024);
            stage.setHeight(768);
        });
        WaitForAsyncUtils.waitForFxEvents();
        AtomicReference<BufferedImage> image = new AtomicReference<>();
        robot.interact(() -> {
            Scene scene = stage.getScene();
            scene.getRoot().applyCss();
            scene.getRoot().layout();
            image.set(PngSnapshots.snapshot(scene));
        });
        assertEquals(1024, image.get().getWidth());
        assertEquals(768, image.get().getHeight());
        return PngSnapshots.save(image.get(), name);
    }
}
