package org.inkgate.admin.gui.rating;

import java.util.ArrayList;
import java.util.List;
import javafx.beans.binding.Bindings;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingDesk.Progress;
import org.inkgate.admin.core.rating.RatingDesk.QueueItem;

/**
 * The desk while a rater works: their queue on the left, the response in the middle (plain,
 * read-only, the same presentation for every response), the rubric with score fields, the
 * comment and "Save and next" on the right, progress at the top.
 */
final class ScoringView {

    static final String ADJUDICATION_NOTE = "Adjudication: an independent further rating. Earlier ratings are not"
            + " shown; score the response on its own, as you would any other.";
    static final String QUALIFICATION_NOTE = "Qualification script: the test owner has agreed scores for it. Score it"
            + " as you would any other; your live scripts open when you have scored the qualification set within the"
            + " test owner's limits.";
    static final String DONE_NOTE = "You have submitted this rating. A change counts only when you save again; the"
            + " earlier rating stays in the record.";

    private final DeskModel model;
    private final BorderPane root = new BorderPane();
    private final ListView<QueueItem> queue;
    private final TextArea responseText = new TextArea();
    private final VBox criteria = new VBox(18);
    private final TextArea comment = new TextArea();
    private final Button saveNext = new Button("Save and next");
    private final List<TextField> scoreFields = new ArrayList<>();
    private final ScrollPane rubricScroll = new ScrollPane();

    ScoringView(DeskModel model) {
        this.model = model;
        queue = queueList();
        root.getStyleClass().add("desk-root");
        root.setTop(header());
        root.setLeft(queuePane());
        root.setCenter(responsePane());
        root.setRight(rubricPane());
        model.revision().addListener((o, was, now) -> refresh());
    }

    Node view() {
        return root;
    }

    /** Where focus goes when the desk opens a response: its first score field, else the queue. */
    Node firstFocus() {
        return scoreFields.isEmpty() ? queue : scoreFields.get(0);
    }

    private Node header() {
        Label title = new Label("Inkgate rating desk");
        title.getStyleClass().add("desk-title");
        Label who = new Label();
        who.setId("raterName");
        who.getStyleClass().add("desk-rater");
        who.textProperty().bind(Bindings.createStringBinding(() -> model.rater().get() == null ? ""
                : "Signed in as " + SignInView.text(model.rater().get()), model.rater()));
        Label progress = new Label();
        progress.setId("progressText");
        progress.getStyleClass().add("desk-progress");
        progress.textProperty().bind(Bindings.createStringBinding(() -> progressText(model.progress().get()),
                model.progress()));
        ProgressBar bar = new ProgressBar();
        bar.setId("progressBar");
        bar.setPrefWidth(180);
        bar.setAccessibleText("Share of your queue rated");
        bar.progressProperty().bind(Bindings.createDoubleBinding(() -> {
            Progress p = model.progress().get();
            return p == null || p.total() == 0 ? 0.0 : (double) p.rated() / p.total();
        }, model.progress()));
        Button signOut = new Button("Sign out");
        signOut.setId("signOut");
        signOut.setOnAction(e -> model.signOut());
        DeskKeys.enterFires(signOut);
        Region grow = new Region();
        HBox.setHgrow(grow, Priority.ALWAYS);
        HBox header = new HBox(20, title, who, grow, progress, bar, signOut);
        header.setAlignment(Pos.CENTER_LEFT);
        header.getStyleClass().add("desk-header");
        return header;
    }

    static String progressText(Progress p) {
        return p == null ? "" : "Rated " + p.rated() + " of " + p.total() + "  \u00b7  " + p.remaining() + " remaining  \u00b7  "
                + p.flagged() + " flagged";
    }

    private ListView<QueueItem> queueList() {
        ListView<QueueItem> list = new ListView<>(model.queue());
        list.setId("queue");
        list.setAccessibleText("Your queue");
        list.getStyleClass().add("queue-list");
        list.setCellFactory(l -> new ListCell<>() {
            @Override
            protected void updateItem(QueueItem item, boolean empty) {
                super.updateItem(item, empty);
                getStyleClass().removeAll("queue-done", "queue-adjudication");
                if (empty || item == null) {
                    setText(null);
                    setTooltip(null);
                    return;
                }
                setText(queueText(item));
                // long task ids wrap inside the narrow list, and the whole entry is in the tooltip
                setWrapText(true);
                setPrefWidth(0);
                setTooltip(new Tooltip(queueText(item).replace("\n      ", "\n")));
                if (item.done()) {
                    getStyleClass().add("queue-done");
                }
                if (item.kind() == RatingDesk.Kind.ADJUDICATION) {
                    getStyleClass().add("queue-adjudication");
                }
            }
        });
        // opening is explicit (Enter or a click), so moving through the list, or the list refreshing
        // after a submission, never opens a response by itself
        list.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER && !e.isShortcutDown()) {
                openSelected(list);
                e.consume();
            }
        });
        list.setOnMouseClicked(e -> {
            if (e.getButton() == javafx.scene.input.MouseButton.PRIMARY) {
                openSelected(list);
            }
        });
        return list;
    }

    private void openSelected(ListView<QueueItem> list) {
        QueueItem chosen = list.getSelectionModel().getSelectedItem();
        QueueItem open = model.current().get();
        if (chosen == null) {
            return;
        }
        if (open != null && open.blindId().equals(chosen.blindId())) {
            firstFocus().requestFocus();
        } else {
            model.open(chosen);
        }
    }

    static String queueText(QueueItem item) {
        String kind = switch (item.kind()) {
            case ADJUDICATION -> "  adjudication";
            case QUALIFICATION -> "  qualification";
            case RATING -> "";
        };
        return item.position() + ".  " + item.blindId() + kind
                + "\n      " + (item.done() ? "rated" : "to rate") + "  \u00b7  " + item.taskId();
    }

    private Node queuePane() {
        Label heading = new Label("Your queue");
        heading.getStyleClass().add("pane-heading");
        heading.setLabelFor(queue);
        VBox box = new VBox(8, heading, queue);
        VBox.setVgrow(queue, Priority.ALWAYS);
        box.getStyleClass().add("queue-pane");
        box.setPrefWidth(250);
        box.setMinWidth(250);
        return box;
    }

    private Node responsePane() {
        Label heading = new Label();
        heading.setId("itemHeading");
        heading.getStyleClass().add("item-heading");
        heading.textProperty().bind(Bindings.createStringBinding(() -> {
            QueueItem item = model.current().get();
            RatingDesk.BlindResponse r = model.response().get();
            return item == null || r == null ? "" : "Response " + r.blindId();
        }, model.current(), model.response()));
        Label sub = new Label();
        sub.setId("itemTask");
        sub.getStyleClass().add("item-task");
        sub.textProperty().bind(Bindings.createStringBinding(() -> {
            QueueItem item = model.current().get();
            RatingDesk.BlindResponse r = model.response().get();
            return item == null || r == null ? "" : "Task: " + r.taskTitle() + "   \u00b7   item " + item.position() + " of "
                    + model.queue().size();
        }, model.current(), model.response(), model.queue()));
        Label kind = new Label();
        kind.setId("itemKind");
        kind.setWrapText(true);
        kind.getStyleClass().add("adjudication-note");
        kind.textProperty().bind(Bindings.createStringBinding(() -> model.current().get() != null
                && model.current().get().kind() == RatingDesk.Kind.QUALIFICATION ? QUALIFICATION_NOTE : ADJUDICATION_NOTE,
                model.current()));
        kind.visibleProperty().bind(Bindings.createBooleanBinding(() -> model.current().get() != null
                && model.current().get().kind() != RatingDesk.Kind.RATING, model.current()));
        kind.managedProperty().bind(kind.visibleProperty());

        responseText.setId("responseText");
        responseText.setEditable(false);
        responseText.setWrapText(true);
        responseText.getStyleClass().add("response-text");
        responseText.setAccessibleText("Response text, read only");
        responseText.textProperty().bind(Bindings.createStringBinding(() -> model.response().get() == null ? ""
                : model.response().get().text(), model.response()));
        responseText.setContextMenu(new javafx.scene.control.ContextMenu());
        DeskKeys.tabLeaves(responseText, this::firstFocus, () -> queue);
        VBox.setVgrow(responseText, Priority.ALWAYS);
        Label length = new Label();
        length.setId("wordCount");
        length.getStyleClass().add("desk-note");
        length.textProperty().bind(Bindings.createStringBinding(() -> model.response().get() == null ? ""
                : "Length: " + words(model.response().get().text()) + " words (counted the same way for every"
                        + " response)", model.response()));
        sub.setWrapText(true);
        Tooltip fullTask = new Tooltip();
        fullTask.textProperty().bind(sub.textProperty());
        sub.setTooltip(fullTask);
        VBox item = new VBox(10, new VBox(2, heading, sub), kind, promptPane(), responseText, length);
        item.getStyleClass().add("response-pane");
        item.visibleProperty().bind(model.current().isNotNull());

        Label doneHeading = new Label("Queue finished");
        doneHeading.getStyleClass().add("desk-heading");
        Label doneText = new Label();
        doneText.setId("finishedText");
        doneText.setWrapText(true);
        doneText.textProperty().bind(Bindings.createStringBinding(() -> {
            Progress p = model.progress().get();
            return "You have submitted all " + (p == null ? 0 : p.total()) + " ratings in your queue. Thank you."
                    + "\n\nYou can still open any response from the list to read it again or change your rating."
                    + " Sign out when you leave the desk.";
        }, model.progress()));
        VBox finished = new VBox(16, doneHeading, doneText);
        finished.setId("finishedPane");
        finished.getStyleClass().add("finished-pane");
        finished.setMaxWidth(560);
        finished.setMaxHeight(Region.USE_PREF_SIZE);
        finished.visibleProperty().bind(model.finished());
        return new StackPane(item, finished);
    }

    /** The task's prompt above the script, folded away by the rater when not needed. */
    private Node promptPane() {
        TextArea prompt = new TextArea();
        prompt.setId("taskPrompt");
        prompt.setEditable(false);
        prompt.setWrapText(true);
        prompt.setPrefRowCount(5);
        prompt.setAccessibleText("Task prompt, read only");
        prompt.getStyleClass().add("task-prompt");
        prompt.textProperty().bind(Bindings.createStringBinding(() -> {
            RatingDesk.BlindResponse r = model.response().get();
            return r == null ? "" : r.prompt().isBlank() ? "The results store holds no prompt for this task: collect"
                    + " again with the exam source or the unsealed bundle to add it." : r.prompt();
        }, model.response()));
        prompt.setContextMenu(new javafx.scene.control.ContextMenu());
        TitledPane pane = new TitledPane("Task prompt", prompt);
        pane.setId("promptPane");
        pane.setAccessibleText("Task prompt");
        return pane;
    }

    static int words(String text) {
        String t = text == null ? "" : text.strip();
        return t.isEmpty() ? 0 : t.split("\\s+").length;
    }

    private Node rubricPane() {
        Label heading = new Label("Rubric and scores");
        heading.getStyleClass().add("pane-heading");
        Label how = new Label("Type a score in each box (Up and Down step it; Enter moves on). The band that covers"
                + " your score is marked.");
        how.setWrapText(true);
        how.getStyleClass().add("desk-note");

        comment.setId("comment");
        comment.setWrapText(true);
        comment.setPrefRowCount(4);
        comment.setAccessibleText("Comment (optional)");
        comment.textProperty().bindBidirectional(model.comment());
        DeskKeys.tabLeaves(comment, () -> saveNext, () -> scoreFields.isEmpty() ? queue : scoreFields.get(scoreFields.size() - 1));
        Label commentLabel = new Label("Comment (optional)");
        commentLabel.getStyleClass().add("field-label");
        commentLabel.setLabelFor(comment);

        Label doneNote = new Label(DONE_NOTE);
        doneNote.setId("doneNote");
        doneNote.setWrapText(true);
        doneNote.getStyleClass().add("desk-note");
        doneNote.visibleProperty().bind(Bindings.createBooleanBinding(() -> model.current().get() != null
                && model.current().get().done(), model.current()));
        doneNote.managedProperty().bind(doneNote.visibleProperty());

        Label problem = new Label();
        problem.setId("problem");
        problem.setWrapText(true);
        problem.getStyleClass().add("desk-problem");
        problem.textProperty().bind(model.problem());
        problem.visibleProperty().bind(model.problem().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());
        // announced to screen readers when it changes
        problem.setAccessibleRole(javafx.scene.AccessibleRole.TEXT);

        saveNext.setId("saveNext");
        saveNext.getStyleClass().add("primary");
        saveNext.setOnAction(e -> submit());
        saveNext.disableProperty().bind(model.current().isNull());
        DeskKeys.enterFires(saveNext);
        Label keys = new Label("Ctrl+Enter: save and next.  Ctrl+Page Down / Page Up: next / previous response"
                + " without saving (your draft is kept).");
        keys.setWrapText(true);
        keys.getStyleClass().add("desk-note");
        Label status = new Label();
        status.setId("deskStatus");
        status.setWrapText(true);
        status.getStyleClass().add("desk-status");
        status.textProperty().bind(model.status());

        VBox box = new VBox(14, heading, how, criteria, commentLabel, comment, doneNote, ReferPane.of(model));
        box.getStyleClass().add("rubric-pane");
        rubricScroll.setContent(box);
        ScrollPane scroll = rubricScroll;
        scroll.setFitToWidth(true);
        keepInView(comment);
        scroll.getStyleClass().add("rubric-scroll");
        // the button stays in sight however long the rubric is
        VBox footer = new VBox(8, problem, saveNext, keys, status);
        footer.getStyleClass().add("rubric-footer");
        BorderPane column = new BorderPane(scroll);
        column.setBottom(footer);
        column.setPrefWidth(450);
        column.setMinWidth(400);
        column.visibleProperty().bind(model.current().isNotNull());
        // when the queue is finished the column gives its room to the message in the middle
        column.managedProperty().bind(column.visibleProperty());
        return column;
    }

    private void submit() {
        model.submitAndNext().ifPresent(missing -> {
            int index = model.scores().indexOf(missing);
            if (index >= 0 && index < scoreFields.size()) {
                scoreFields.get(index).requestFocus();
            }
        });
    }

    /** Rebuilds the rubric for the response now open, selects it in the queue and puts focus where work starts. */
    private void refresh() {
        criteria.getChildren().clear();
        scoreFields.clear();
        List<DeskModel.CriterionScore> scores = model.scores();
        for (int i = 0; i < scores.size(); i++) {
            int index = i;
            CriterionCard card = new CriterionCard(model, scores.get(i), () -> next(index));
            scoreFields.add(card.field());
            keepInView(card.field());
            criteria.getChildren().add(card.view());
        }
        QueueItem open = model.current().get();
        if (open != null) {
            model.queue().stream().filter(q -> q.blindId().equals(open.blindId())).findFirst().ifPresent(q -> {
                queue.getSelectionModel().select(q);
                queue.scrollTo(Math.max(0, queue.getSelectionModel().getSelectedIndex() - 3));
            });
        } else {
            queue.getSelectionModel().clearSelection();
        }
        DeskKeys.focusWhenShown(model.finished().get() ? queue : firstFocus());
    }

    /** Scrolls the rubric so a control that gains focus is in sight (a scroll pane does not do it by itself). */
    private void keepInView(Node node) {
        node.focusedProperty().addListener((o, was, focused) -> {
            Node content = rubricScroll.getContent();
            if (!focused || content == null) {
                return;
            }
            javafx.geometry.Bounds b = content.sceneToLocal(node.localToScene(node.getBoundsInLocal()));
            double contentHeight = content.getBoundsInLocal().getHeight();
            double viewHeight = rubricScroll.getViewportBounds().getHeight();
            double room = contentHeight - viewHeight;
            if (room <= 0) {
                return;
            }
            double top = rubricScroll.getVvalue() * room;
            // a little margin so the label above a field shows too
            if (b.getMinY() - 40 < top) {
                rubricScroll.setVvalue(Math.max(0, (b.getMinY() - 40) / room));
            } else if (b.getMaxY() + 16 > top + viewHeight) {
                rubricScroll.setVvalue(Math.min(1, (b.getMaxY() + 16 - viewHeight) / room));
            }
        });
    }

    /** Enter in a score box: the next score box, or after the last one the comment. */
    private void next(int index) {
        (index + 1 < scoreFields.size() ? scoreFields.get(index + 1) : comment).requestFocus();
    }

    /** Ctrl+Enter anywhere on the desk. */
    void submitFromKeyboard() {
        if (model.current().get() != null) {
            submit();
        }
    }

    TextArea responseArea() {
        return responseText;
    }
}
