package org.inkgate.client.sitting.ui.screen;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Consumer;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.RadioButton;
import javafx.scene.control.TextArea;
import javafx.scene.control.ToggleGroup;
import javafx.scene.layout.VBox;
import org.inkgate.client.sitting.ui.parts.Parts;
import org.inkgate.format.bundle.QuestionItem;
import org.inkgate.format.bundle.QuestionnaireSpec;

/**
 * A questionnaire before or after the tasks. Every item may be left unanswered: the answers are
 * for research, and an unanswered item is recorded as missing, never guessed.
 */
public final class QuestionnaireScreen {

    private final Map<String, ToggleGroup> likert = new LinkedHashMap<>();
    private final Map<String, TextArea> freeText = new LinkedHashMap<>();
    private final Button done;
    private final Parent root;

    public QuestionnaireScreen(QuestionnaireSpec questionnaire, Consumer<Map<String, String>> onDone) {
        VBox items = new VBox(10);
        int n = 1;
        for (QuestionItem item : questionnaire.items()) {
            items.getChildren().add(item(n++, item));
        }
        done = Parts.primary("questionnaireDone", "_Continue", () -> onDone.accept(answers()));
        VBox box = new VBox(14,
                Parts.heading(questionnaire.title()),
                Parts.quiet("These questions are not marked. You may leave any of them unanswered."),
                items);
        root = Parts.cardWithActions("questionnaireScreen", done, box);
    }

    private VBox item(int number, QuestionItem item) {
        Label question = new Label(number + ". " + item.text());
        question.setWrapText(true);
        question.getStyleClass().add("question-text");
        VBox box = new VBox(question);
        box.getStyleClass().add("question");
        switch (item.kind()) {
            case LIKERT -> {
                ToggleGroup group = new ToggleGroup();
                int point = 1;
                for (String label : item.labels()) {
                    RadioButton choice = new RadioButton(label);
                    choice.setId("q-" + item.id() + "-" + point);
                    choice.setUserData(Integer.toString(point++));
                    choice.setToggleGroup(group);
                    choice.setAccessibleHelp(item.text());
                    box.getChildren().add(choice);
                }
                likert.put(item.id(), group);
            }
            case FREE_TEXT -> {
                TextArea area = new TextArea();
                area.setId("q-" + item.id());
                area.setWrapText(true);
                area.setPrefRowCount(4);
                area.setAccessibleText(item.text());
                question.setLabelFor(area);
                box.getChildren().add(area);
                freeText.put(item.id(), area);
            }
        }
        return box;
    }

    /** Item id to the chosen Likert point (1-based) or the free text; unanswered items are left out. */
    public Map<String, String> answers() {
        Map<String, String> answers = new LinkedHashMap<>();
        likert.forEach((id, group) -> {
            if (group.getSelectedToggle() != null) {
                answers.put(id, (String) group.getSelectedToggle().getUserData());
            }
        });
        freeText.forEach((id, area) -> {
            if (!area.getText().isBlank()) {
                answers.put(id, area.getText().strip());
            }
        });
        return answers;
    }

    public Parent root() {
        return root;
    }

    public void focus() {
        likert.values().stream().findFirst().map(g -> g.getToggles().getFirst())
                .ifPresentOrElse(t -> Parts.focusWhenShown((RadioButton) t), done::requestFocus);
    }
}
