package org.inkgate.client.task;

import javafx.geometry.Pos;
import javafx.scene.AccessibleRole;
import javafx.scene.control.Label;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.Region;
import org.inkgate.client.practice.TaskWording;
import org.inkgate.format.bundle.WordGuidance;

/**
 * The line under the answer: the live word count (only when the policy shows it) and the task's
 * word guidance, said calmly: the limits are advice, nothing stops or colours the writing.
 */
final class WordStatus extends FlowPane {

    private final boolean showCount;
    private final WordGuidance guidance;
    private final Label count = new Label();
    private final Label advice = new Label();
    private final Label checker = new Label();

    WordStatus(boolean showCount, WordGuidance guidance) {
        this.showCount = showCount;
        this.guidance = guidance;
        getStyleClass().add("word-status");
        setAlignment(Pos.CENTER_LEFT);
        // a narrow answer column (large print, small window) puts the guidance under the count, wrapped
        // if need be; the count itself is never shortened. A flow pane's own minimum is its widest
        // child's preferred width, which would push the column wider than the window: no minimum here
        setHgap(16);
        setVgap(4);
        setMinWidth(0);
        count.setMinWidth(Region.USE_PREF_SIZE);
        for (Label wraps : new Label[] {advice, checker}) {
            wraps.setMinWidth(0);
            wraps.setMinHeight(Region.USE_PREF_SIZE);
            wraps.maxWidthProperty().bind(widthProperty().subtract(snappedLeftInset() + snappedRightInset() + 1));
        }
        checker.managedProperty().bind(checker.textProperty().isNotEmpty());
        count.setId("wordCount");
        count.getStyleClass().add("word-count");
        count.setAccessibleRole(AccessibleRole.TEXT);
        advice.setId("wordGuidance");
        advice.getStyleClass().add("word-guidance");
        advice.setWrapText(true);
        advice.setText(TaskWording.guidance(guidance));
        checker.setId("checkStatus");
        checker.getStyleClass().add("check-status");
        checker.setWrapText(true);
        if (showCount) {
            getChildren().add(count);
        }
        getChildren().addAll(advice, checker);
    }

    /** Shows the count for the answer as it now stands. */
    void words(int words) {
        if (!showCount) {
            return;
        }
        count.setText(TaskWording.wordCount(words));
        count.setAccessibleText(TaskWording.wordCount(words) + " written");
        advice.setText(adviceFor(words, guidance));
    }

    /** A plain note about the checker (e.g. that it stopped working), or empty. */
    void checkerNote(String text) {
        checker.setText(text);
    }

    /** The guidance, with a calm note once the count is past the suggested maximum. */
    static String adviceFor(int words, WordGuidance guidance) {
        String base = TaskWording.guidance(guidance);
        if (guidance != null && guidance.max() > 0 && words > guidance.max()) {
            return base + " (you are past the suggested maximum; this is advice, not a limit)";
        }
        return base;
    }
}
