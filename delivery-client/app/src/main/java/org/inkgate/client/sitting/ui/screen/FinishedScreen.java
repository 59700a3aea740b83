package org.inkgate.client.sitting.ui.screen;

import javafx.scene.Parent;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.parts.Parts;

/** The end: the answers were handed in; the invigilator closes the program. */
public final class FinishedScreen {

    private final Parent root;

    /**
     * @param packageLine where the response package went, for the invigilator
     */
    public FinishedScreen(String packageLine) {
        VBox box = new VBox(14,
                Parts.heading("Your answers have been handed in"),
                Parts.text("Thank you. You do not need to do anything else. Please stay in your seat until the"
                        + " invigilator tells you that you may leave."),
                Parts.quiet(packageLine));
        root = Parts.card("finishedScreen", box);
    }

    public Parent root() {
        return root;
    }
}
