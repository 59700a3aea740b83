package org.inkgate.admin.gui.rating;

import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.TextFormatter;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.inkgate.admin.core.source.ExamSource;

/**
 * One rubric criterion on the desk: its name and range, the score box (digits refused as typed
 * when they can never make a score in range; Up and Down step; Enter moves on), the message that
 * says why a keystroke was refused, and the band descriptors with the band covering the score marked.
 */
final class CriterionCard {

    private final VBox root;
    private final TextField field = new TextField();

    CriterionCard(DeskModel model, DeskModel.CriterionScore score, Runnable onEnter) {
        ExamSource.Criterion c = score.criterion();
        String range = c.minScore() + " to " + c.maxScore();
        field.setId("score-" + c.id());
        field.setPrefColumnCount(3);
        field.setMaxWidth(80);
        field.getStyleClass().add("score-field");
        field.setAccessibleText(c.name() + ": score from " + range);
        field.setTextFormatter(new TextFormatter<String>(change -> {
            if (!change.isContentChange()) {
                return change;
            }
            if (ScoreEntry.of(c, change.getControlNewText()) instanceof ScoreEntry.Refused r) {
                model.refused(score, r.message());
                return null;
            }
            return change;
        }));
        field.setText(score.text().get());
        field.textProperty().bindBidirectional(score.text());
        field.addEventFilter(KeyEvent.KEY_PRESSED, e -> {
            if (e.isShortcutDown() || e.isAltDown()) {
                return;
            }
            switch (e.getCode()) {
                case UP -> model.step(score, +1);
                case DOWN -> model.step(score, -1);
                case ENTER -> onEnter.run();
                default -> {
                    return;
                }
            }
            e.consume();
        });

        Label name = new Label(c.name());
        name.getStyleClass().add("criterion-name");
        name.setLabelFor(field);
        Label rangeLabel = new Label("scores " + range);
        rangeLabel.getStyleClass().add("desk-note");
        HBox top = new HBox(12, name, rangeLabel);
        top.setAlignment(Pos.BASELINE_LEFT);
        Label message = new Label();
        message.setId("message-" + c.id());
        message.setWrapText(true);
        message.getStyleClass().add("score-message");
        message.textProperty().bind(score.message());
        message.visibleProperty().bind(score.message().isNotEmpty());
        message.managedProperty().bind(message.visibleProperty());
        // JavaFX has no live regions: the message also becomes the box's help text, which screen readers read with it
        field.accessibleHelpProperty().bind(score.message());

        VBox bands = new VBox(4);
        for (ExamSource.Band band : c.bands()) {
            bands.getChildren().add(bandRow(score, band));
        }
        root = new VBox(8, top, new HBox(12, field), message, bands);
        root.getStyleClass().add("criterion-card");
    }

    Node view() {
        return root;
    }

    TextField field() {
        return field;
    }

    private static Node bandRow(DeskModel.CriterionScore score, ExamSource.Band band) {
        Label scores = new Label(band.from() == band.to() ? Integer.toString(band.from()) : band.from() + "\u2013" + band.to());
        scores.getStyleClass().add("band-scores");
        scores.setMinWidth(48);
        Label text = new Label(band.descriptor());
        text.setWrapText(true);
        text.getStyleClass().add("band-text");
        HBox.setHgrow(text, Priority.ALWAYS);
        HBox row = new HBox(10, scores, text);
        row.getStyleClass().add("band");
        Runnable mark = () -> {
            boolean covers = score.score().map(s -> s >= band.from() && s <= band.to()).orElse(false);
            row.getStyleClass().remove("band-current");
            if (covers) {
                row.getStyleClass().add("band-current");
            }
            row.setAccessibleText("Band " + scores.getText() + ": " + band.descriptor() + (covers ? " (covers your score)" : ""));
        };
        score.entry().addListener((o, was, now) -> mark.run());
        mark.run();
        return row;
    }
}
