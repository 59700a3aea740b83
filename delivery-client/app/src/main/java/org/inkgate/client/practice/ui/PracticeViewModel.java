package org.inkgate.client.practice.ui;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.client.practice.PracticeExam;
import org.inkgate.client.practice.PracticeForm;
import org.inkgate.client.practice.PracticeTask;
import org.inkgate.client.practice.PromptText;
import org.inkgate.client.practice.TaskWording;
import org.inkgate.client.practice.WordCount;

/**
 * Everything the practice window shows of an opened exam, as JavaFX properties the views bind
 * to. Choosing a form lists its tasks and selects the first; choosing a task shows its prompt,
 * tools and word guidance. Practice writing is kept per task while the window is open and is
 * never saved.
 */
public final class PracticeViewModel {

    private final PracticeExam exam;
    private final ObservableList<PracticeForm> forms;
    private final ObjectProperty<PracticeForm> selectedForm = new SimpleObjectProperty<>(this, "selectedForm");
    private final ObservableList<PracticeTask> tasks = FXCollections.observableArrayList();
    private final ObservableList<PracticeTask> readOnlyTasks = FXCollections.unmodifiableObservableList(tasks);
    private final ObjectProperty<PracticeTask> selectedTask = new SimpleObjectProperty<>(this, "selectedTask");
    private final ReadOnlyStringWrapper taskHeading = new ReadOnlyStringWrapper(this, "taskHeading", "");
    private final ReadOnlyStringWrapper conditionText = new ReadOnlyStringWrapper(this, "conditionText", "");
    private final ReadOnlyStringWrapper toolsText = new ReadOnlyStringWrapper(this, "toolsText", "");
    private final ReadOnlyBooleanWrapper toolsOffered = new ReadOnlyBooleanWrapper(this, "toolsOffered");
    private final ReadOnlyStringWrapper timeText = new ReadOnlyStringWrapper(this, "timeText", "");
    private final ReadOnlyStringWrapper guidanceText = new ReadOnlyStringWrapper(this, "guidanceText", "");
    private final ReadOnlyObjectWrapper<PromptText> prompt =
            new ReadOnlyObjectWrapper<>(this, "prompt", new PromptText(List.of()));
    private final ReadOnlyStringWrapper afterTasksText = new ReadOnlyStringWrapper(this, "afterTasksText", "");
    private final ReadOnlyStringWrapper editorDescription = new ReadOnlyStringWrapper(this, "editorDescription", "");
    private final StringProperty draft = new SimpleStringProperty(this, "draft", "");
    private final ReadOnlyStringWrapper wordCountText = new ReadOnlyStringWrapper(this, "wordCountText", "");
    private final ReadOnlyBooleanWrapper wordCountShown = new ReadOnlyBooleanWrapper(this, "wordCountShown");
    private final Map<String, String> draftsByTask = new HashMap<>();

    public PracticeViewModel(PracticeExam exam) {
        this.exam = exam;
        this.forms = FXCollections.unmodifiableObservableList(FXCollections.observableArrayList(exam.forms()));
        selectedForm.addListener((obs, old, form) -> showForm(form));
        selectedTask.addListener((obs, old, task) -> showTask(old, task));
        draft.addListener((obs, old, text) -> updateWordCount());
        selectedForm.set(exam.forms().getFirst());
    }

    /** "Inkgate - exam title (practice)". */
    public String windowTitle() {
        return "Inkgate - " + exam.title() + " (practice)";
    }

    public String examTitle() {
        return exam.title();
    }

    /** Who signed the bundle, and why in practice that proves little. */
    public String signerText() {
        return "Signed with key " + exam.signerFingerprint() + ". Practice mode opens bundles from any signer:"
                + " compare this with the fingerprint the test owner published.";
    }

    public PromptText instructions() {
        return exam.instructions();
    }

    public ObservableList<PracticeForm> forms() {
        return forms;
    }

    public ObjectProperty<PracticeForm> selectedFormProperty() {
        return selectedForm;
    }

    /** The tasks of the chosen form, in the order they are sat. */
    public ObservableList<PracticeTask> tasks() {
        return readOnlyTasks;
    }

    public ObjectProperty<PracticeTask> selectedTaskProperty() {
        return selectedTask;
    }

    /** Selects a task of the current form; null (a list losing its selection) keeps the current one. */
    public void selectTask(PracticeTask task) {
        if (task != null && tasks.contains(task)) {
            selectedTask.set(task);
        }
    }

    public ReadOnlyStringProperty taskHeadingProperty() {
        return taskHeading.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty conditionTextProperty() {
        return conditionText.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty toolsTextProperty() {
        return toolsText.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty toolsOfferedProperty() {
        return toolsOffered.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty timeTextProperty() {
        return timeText.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty guidanceTextProperty() {
        return guidanceText.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<PromptText> promptProperty() {
        return prompt.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty afterTasksTextProperty() {
        return afterTasksText.getReadOnlyProperty();
    }

    /** What a screen reader says for the writing area. */
    public ReadOnlyStringProperty editorDescriptionProperty() {
        return editorDescription.getReadOnlyProperty();
    }

    /** The practice text of the selected task. */
    public StringProperty draftProperty() {
        return draft;
    }

    public ReadOnlyStringProperty wordCountTextProperty() {
        return wordCountText.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty wordCountShownProperty() {
        return wordCountShown.getReadOnlyProperty();
    }

    private void showForm(PracticeForm form) {
        if (form == null) {
            // a chooser cannot leave the window without a form
            selectedForm.set(exam.forms().getFirst());
            return;
        }
        afterTasksText.set(form.afterTasks());
        tasks.setAll(form.tasks());
        selectedTask.set(form.tasks().getFirst());
    }

    private void showTask(PracticeTask previous, PracticeTask task) {
        if (previous != null) {
            draftsByTask.put(previous.taskId(), draft.get());
        }
        if (task == null) {
            return;
        }
        int count = tasks.size();
        taskHeading.set("Task " + task.position() + " of " + count + ": " + task.title());
        conditionText.set(task.conditionLabel());
        toolsText.set(String.join("\n", task.tools()));
        toolsOffered.set(task.offersTools());
        timeText.set(TaskWording.time(task.timeLimitSeconds()));
        guidanceText.set(TaskWording.guidance(task.words()));
        prompt.set(task.prompt());
        editorDescription.set("Practice writing for task " + task.position() + ", " + task.title()
                + ". Not saved and not submitted.");
        wordCountShown.set(task.policy().showWordCount());
        draft.set(draftsByTask.getOrDefault(task.taskId(), ""));
        updateWordCount();
    }

    private void updateWordCount() {
        PracticeTask task = selectedTask.get();
        boolean shown = task != null && task.policy().showWordCount();
        wordCountText.set(shown ? TaskWording.wordCount(WordCount.of(draft.get()))
                : "The word count is not shown in this task");
    }
}
