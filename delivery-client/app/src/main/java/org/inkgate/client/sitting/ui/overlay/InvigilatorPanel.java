package org.inkgate.client.sitting.ui.overlay;

import java.util.function.IntConsumer;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.Spinner;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.Parts;

/**
 * The invigilator's screen, opened behind the PIN: the state of this machine's sitting, every
 * time the window lost focus, and the actions (pause, add time, end the task, exit).
 */
public final class InvigilatorPanel extends StackPane {

    /** What the panel's buttons do; the flow implements it. */
    public interface Actions {
        void pauseOrResume();

        void addMinutes(int minutes);

        void endTask();

        void exitSitting();

        void close();
    }

    private final Label state = Parts.text("");
    private final ObservableList<String> focusLines = FXCollections.observableArrayList();
    private final Button pause;
    private final Button addTime;
    private final Button endTask;
    private final Button exit;
    private final Button confirmExit;
    private final Spinner<Integer> minutes = new Spinner<>(1, 120, 5);

    public InvigilatorPanel(Actions actions) {
        setId("invigilatorPanel");
        getStyleClass().add("overlay-shade");
        state.setId("invigilatorState");
        ListView<String> focus = new ListView<>(focusLines);
        focus.setId("focusLog");
        focus.getStyleClass().add("focus-log");
        focus.setAccessibleText("Times the sitting window lost focus");
        focus.setPlaceholder(new Label("The window has not lost focus."));
        minutes.setId("addMinutes");
        minutes.setEditable(true);
        minutes.setAccessibleText("Minutes to add");
        minutes.setPrefWidth(110);
        pause = Parts.plain("pauseButton", "_Pause the exam", actions::pauseOrResume);
        addTime = Parts.plain("addTimeButton", "_Add minutes to this task", () -> actions.addMinutes(minutes.getValue()));
        endTask = Parts.plain("endTaskButton", "_End the current task", actions::endTask);
        exit = Parts.plain("exitButton", "E_xit the sitting...", () -> askExit(true));
        confirmExit = Parts.plain("confirmExitButton", "Yes, e_xit now", actions::exitSitting);
        confirmExit.setVisible(false);
        confirmExit.setManaged(false);
        Button close = Parts.primary("closePanelButton", "_Back to the candidate's screen", actions::close);
        close.setCancelButton(true);

        FlowPane buttons = new FlowPane(12, 12, pause, new HBox(8, minutes, addTime), endTask, exit, confirmExit);
        VBox card = new VBox(12,
                Parts.heading("Invigilator"),
                state,
                Parts.fieldLabel("Focus _lost (the candidate left the window)", focus), focus,
                buttons,
                Parts.quiet("Exiting ends the sitting without handing in; the answers stay saved on this machine"
                        + " and the sitting can be resumed. Follow the test owner's regulations for any action here."),
                close);
        card.getStyleClass().add("overlay-card");
        card.setMaxSize(760, VBox.USE_PREF_SIZE);
        StackPane.setAlignment(card, Pos.CENTER);
        getChildren().add(card);
    }

    /** Updates the state line and the buttons that make sense now. */
    public void update(String stateText, boolean paused, boolean inTask) {
        state.setText(stateText);
        state.setAccessibleText(stateText);
        pause.setText(paused ? "_Resume the exam" : "_Pause the exam");
        addTime.setDisable(!inTask);
        minutes.setDisable(!inTask);
        endTask.setDisable(!inTask || paused);
        askExit(false);
    }

    /** Adds one line to the focus log. */
    public void focusEvent(String line) {
        focusLines.add(line);
    }

    /** Lines in the focus log, oldest first. */
    public ObservableList<String> focusLines() {
        return focusLines;
    }

    public void focus() {
        pause.requestFocus();
    }

    private void askExit(boolean asking) {
        exit.setVisible(!asking);
        exit.setManaged(!asking);
        confirmExit.setVisible(asking);
        confirmExit.setManaged(asking);
        if (asking) {
            confirmExit.requestFocus();
        }
    }
}
