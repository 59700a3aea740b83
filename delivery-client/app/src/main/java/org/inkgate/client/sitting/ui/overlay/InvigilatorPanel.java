package org.inkgate.client.sitting.ui.overlay;

import java.util.function.IntConsumer;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Spinner;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.parts.Parts;

/**
 * The invigilator's screen, opened behind the PIN: the state of this machine's sitting, every
 * time the window lost focus, the other things that happened to the sitting (pauses, added time,
 * downtime, saving trouble), and the actions that make sense at that moment: pause, add time and
 * end the task while the candidate works; next candidate or exit once the answers are handed in.
 */
public final class InvigilatorPanel extends StackPane {

    /** What the panel's buttons do; the flow implements it. */
    public interface Actions {
        void pauseOrResume();

        void addMinutes(int minutes);

        void endTask();

        void nextCandidate();

        void exitSitting();

        void close();
    }

    /** Where the sitting is, as far as the invigilator's actions go. */
    public enum Moment {
        /** No candidate has signed in (or the last one handed in and the next has not signed in). */
        NO_CANDIDATE,
        /** A candidate is signed in but not in a task (instructions, questionnaires, review). */
        AT_WORK,
        /** A candidate is writing a task. */
        IN_TASK,
        /** The answers were confirmed; the package is being written or waits for the output folder. */
        HANDING_IN,
        /** The package is written: nothing runs any more. */
        HANDED_IN
    }

    /** What ending a task does to the candidate, shown before the invigilator confirms it. */
    static final String END_TASK_WARNING = "Ending the task saves the candidate's answer as it stands now and moves"
            + " them on to the next task (or to the last questions and the hand-in). The rest of this task's time is"
            + " lost and the candidate cannot go back to it.";
    private static final String EXIT_UNFINISHED = "Exiting ends the sitting without handing in; the answers stay saved on"
            + " this machine and the sitting can be resumed. Follow the test owner's regulations for any action here.";
    private static final String EXIT_HANDED_IN = "The answers are handed in. Next candidate starts a new sitting on this"
            + " machine with the same output folder; exiting closes the program.";

    private static final String EXIT_NO_CANDIDATE = "No candidate is signed in; exiting closes the program.";

    private final Label state = Parts.text("");
    private final Label exitNote = Parts.quiet(EXIT_UNFINISHED);
    private final ObservableList<String> focusLines = FXCollections.observableArrayList();
    private final ObservableList<String> eventLines = FXCollections.observableArrayList();
    private final Button pause;
    private final HBox addTimeRow;
    private final Button addTime;
    private final Button endTask;
    private final Button confirmEndTask;
    private final Label endTaskWarning;
    private final Button nextCandidate;
    private final Button exit;
    private final Button confirmExit;
    private final Spinner<Integer> minutes = new Spinner<>(1, 120, 5);
    private Moment shownMoment;
    private boolean shownPaused;

    public InvigilatorPanel(Actions actions) {
        setId("invigilatorPanel");
        getStyleClass().add("overlay-shade");
        state.setId("invigilatorState");
        exitNote.setId("exitNote");
        ListView<String> focus = log("focusLog", focusLines, "Times the sitting window lost focus",
                "The window has not lost focus.");
        ListView<String> events = log("sittingEventLog", eventLines,
                "Pauses, added time, downtime and saving trouble in this sitting", "Nothing else has happened.");
        minutes.setId("addMinutes");
        minutes.setEditable(true);
        minutes.setAccessibleText("Minutes to add");
        minutes.setPrefWidth(110);
        pause = Parts.plain("pauseButton", "_Pause the exam", actions::pauseOrResume);
        addTime = Parts.plain("addTimeButton", "_Add minutes to this task", () -> actions.addMinutes(minutes.getValue()));
        addTimeRow = new HBox(8, minutes, addTime);
        endTask = Parts.plain("endTaskButton", "_End the current task...", () -> askEndTask(true));
        confirmEndTask = Parts.plain("confirmEndTaskButton", "_Yes, end the task now", actions::endTask);
        endTaskWarning = Parts.text(END_TASK_WARNING);
        endTaskWarning.setId("endTaskWarning");
        nextCandidate = Parts.plain("nextCandidateButton", "_Next candidate", actions::nextCandidate);
        exit = Parts.plain("exitButton", "E_xit the sitting...", () -> askExit(true));
        confirmExit = Parts.plain("confirmExitButton", "Yes, e_xit now", actions::exitSitting);
        confirmExit.setVisible(false);
        confirmExit.setManaged(false);
        Button close = Parts.primary("closePanelButton", "_Back to the candidate's screen", actions::close);
        close.setCancelButton(true);

        FlowPane buttons = new FlowPane(12, 12, pause, addTimeRow, endTask, nextCandidate, exit, confirmExit);
        // side by side, half the card each, so the screen is no taller than with the focus list alone
        GridPane lists = new GridPane();
        lists.setHgap(12);
        lists.setVgap(4);
        for (int i = 0; i < 2; i++) {
            ColumnConstraints half = new ColumnConstraints();
            half.setPercentWidth(50);
            lists.getColumnConstraints().add(half);
        }
        lists.addRow(0, Parts.fieldLabel("Focus _lost (left the window)", focus),
                Parts.fieldLabel("Other e_vents", events));
        lists.addRow(1, focus, events);
        // the actions right under the state, the logs after them: what to do next is in view without scrolling
        VBox body = new VBox(12,
                state,
                buttons,
                endTaskWarning, confirmEndTask,
                exitNote,
                lists);
        // on a short window or in large print the middle scrolls; the heading and the way back stay in view
        ScrollPane middle = new ScrollPane(body);
        middle.setId("invigilatorScroller");
        middle.setFitToWidth(true);
        middle.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        middle.setFocusTraversable(false);
        middle.getStyleClass().add("overlay-scroller");
        VBox.setVgrow(middle, Priority.ALWAYS);
        VBox card = new VBox(12, Parts.heading("Invigilator"), middle, close);
        card.getStyleClass().add("overlay-card");
        // no taller than its content, and no taller than the window: the shade's StackPane shrinks it to fit
        card.setMaxSize(760, VBox.USE_PREF_SIZE);
        StackPane.setAlignment(card, Pos.CENTER);
        getChildren().add(card);
        update("", Moment.NO_CANDIDATE, false);
    }

    private static ListView<String> log(String id, ObservableList<String> lines, String accessible, String empty) {
        ListView<String> list = new ListView<>(lines);
        list.setId(id);
        list.getStyleClass().add("focus-log");
        list.setAccessibleText(accessible);
        Label placeholder = new Label(empty);
        placeholder.setWrapText(true);
        list.setPlaceholder(placeholder);
        list.setCellFactory(view -> {
            ListCell<String> cell = new ListCell<>() {
                @Override
                protected void updateItem(String item, boolean empty) {
                    super.updateItem(item, empty);
                    setText(empty ? null : item);
                }
            };
            cell.setWrapText(true); // long lines (a package's path, a saving error) stay readable without scrolling
            cell.prefWidthProperty().bind(view.widthProperty().subtract(24));
            return cell;
        });
        return list;
    }

    /** Updates the state line and shows the actions that make sense at this moment. */
    public void update(String stateText, Moment moment, boolean paused) {
        state.setText(stateText);
        state.setAccessibleText(stateText);
        boolean candidateAtWork = moment == Moment.AT_WORK || moment == Moment.IN_TASK;
        boolean inTask = moment == Moment.IN_TASK;
        // a pause can only be undone while a candidate works: elsewhere it is offered only to resume
        show(pause, candidateAtWork || paused);
        pause.setText(paused ? "_Resume the exam" : "_Pause the exam");
        show(addTimeRow, candidateAtWork);
        show(addTime, candidateAtWork);
        show(minutes, candidateAtWork);
        addTime.setDisable(!inTask);
        minutes.setDisable(!inTask);
        show(endTask, candidateAtWork);
        endTask.setDisable(!inTask || paused);
        show(nextCandidate, moment == Moment.HANDED_IN);
        exitNote.setText(switch (moment) {
            case NO_CANDIDATE -> EXIT_NO_CANDIDATE;
            case HANDED_IN -> EXIT_HANDED_IN;
            case AT_WORK, IN_TASK, HANDING_IN -> EXIT_UNFINISHED;
        });
        if (moment != shownMoment || paused != shownPaused) {
            // a question asked at another moment no longer applies; the screen refreshes every tick, so only then
            askExit(false);
            askEndTask(false);
        }
        shownMoment = moment;
        shownPaused = paused;
    }

    private static void show(javafx.scene.Node node, boolean shown) {
        node.setVisible(shown);
        node.setManaged(shown);
    }

    /** Adds one line to the focus log. */
    public void focusEvent(String line) {
        focusLines.add(line);
    }

    /** Adds one line to the other events of the sitting. */
    public void sittingEvent(String line) {
        eventLines.add(line);
    }

    /** Lines in the focus log, oldest first. */
    public ObservableList<String> focusLines() {
        return focusLines;
    }

    public void focus() {
        (pause.isVisible() ? pause : nextCandidate.isVisible() ? nextCandidate : exit).requestFocus();
    }

    /** Ending a task cannot be undone, so it is asked twice, with what it does to the candidate. */
    private void askEndTask(boolean asking) {
        endTaskWarning.setVisible(asking);
        endTaskWarning.setManaged(asking);
        confirmEndTask.setVisible(asking);
        confirmEndTask.setManaged(asking);
        if (asking) {
            askExit(false);
            confirmEndTask.requestFocus();
        }
    }

    private void askExit(boolean asking) {
        if (asking) {
            askEndTask(false);
        }
        exit.setVisible(!asking);
        exit.setManaged(!asking);
        confirmExit.setVisible(asking);
        confirmExit.setManaged(asking);
        if (asking) {
            confirmExit.requestFocus();
        }
    }
}
