package org.inkgate.client.sitting.ui;

import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Label;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;

/**
 * The frame every screen of the sitting sits in: a quiet top strip (exam, who is signed in, time
 * left), the announcement strip under it, the current screen, and one layer above for the pause
 * cover and the invigilator's overlays.
 */
public final class SittingShell {

    private final StackPane root = new StackPane();
    private final BorderPane base = new BorderPane();
    private final Label title = new Label();
    private final Label who = new Label();
    private final Label time = new Label();
    private final Announcer announcer = new Announcer();

    public SittingShell(String examTitle) {
        root.setId("sittingRoot");
        root.getStyleClass().add("sitting-root");
        title.setText(examTitle);
        title.setId("stripTitle");
        title.getStyleClass().add("strip-title");
        // on a narrow window or in large print the title wraps; nothing in the strip is shortened to "..."
        title.setWrapText(true);
        title.setMinHeight(Region.USE_PREF_SIZE);
        title.setMinWidth(0);
        HBox.setHgrow(title, Priority.SOMETIMES);
        who.setMinWidth(Region.USE_PREF_SIZE);
        who.setId("stripWho");
        who.getStyleClass().add("strip-detail");
        time.setId("timeLeft");
        time.getStyleClass().add("time-left");
        time.setVisible(false);
        time.setMinWidth(Region.USE_PREF_SIZE);
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox strip = new HBox(title, who, gap, time);
        strip.getStyleClass().add("sitting-strip");
        base.setTop(new VBox(strip, announcer));
        root.getChildren().add(base);
    }

    public Parent root() {
        return root;
    }

    public Announcer announcer() {
        return announcer;
    }

    /** Replaces the current screen. */
    public void show(Node screen) {
        base.setCenter(screen);
    }

    /** The line beside the title, e.g. "Candidate 1001". */
    public void who(String text) {
        who.setText(text);
    }

    /** Shows the time left; {@code low} marks the last minutes. Null hides the clock. */
    public void time(String text, String spoken, boolean low) {
        time.setVisible(text != null);
        time.setText(text == null ? "" : text);
        time.setAccessibleText(spoken);
        time.getStyleClass().remove("time-low");
        if (low) {
            time.getStyleClass().add("time-low");
        }
    }

    /** Puts a layer over everything (pause cover, PIN prompt, invigilator panel). */
    public void cover(Node layer) {
        if (!root.getChildren().contains(layer)) {
            root.getChildren().add(layer);
        }
    }

    /** Removes a layer put there by {@link #cover}. */
    public void uncover(Node layer) {
        root.getChildren().remove(layer);
    }

    /** True while the layer is shown. */
    public boolean covered(Node layer) {
        return root.getChildren().contains(layer);
    }

    /** Hides what is underneath from screen readers and focus while a layer is on top. */
    public void baseDisabled(boolean disabled) {
        base.setDisable(disabled);
    }
}
