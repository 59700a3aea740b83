package org.inkgate.client.sitting.ui.overlay;

import javafx.geometry.Pos;
import javafx.scene.control.Label;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.parts.Parts;

/** Covers the candidate's screen while the invigilator has paused the sitting; the clock is stopped. */
public final class PausedCover extends StackPane {

    public static final String HEADING = "The exam is paused";
    public static final String DETAIL = "The clock has stopped, and your work is saved. Please stay in your seat"
            + " and wait for the invigilator. Your time will continue when the exam resumes.";

    public PausedCover() {
        setId("pausedCover");
        getStyleClass().add("paused-cover");
        Label heading = Parts.heading(HEADING);
        heading.getStyleClass().add("paused-heading");
        VBox box = new VBox(18, heading, Parts.text(DETAIL));
        box.setAlignment(Pos.CENTER);
        box.setMaxWidth(720);
        setAccessibleText(HEADING + ". " + DETAIL);
        getChildren().add(box);
    }
}
