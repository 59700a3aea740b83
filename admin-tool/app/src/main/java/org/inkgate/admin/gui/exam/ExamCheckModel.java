package org.inkgate.admin.gui.exam;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.admin.core.bundling.PreviewBundle;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Messages;
import org.inkgate.client.practice.PracticeLoad;
import org.inkgate.client.practice.PracticeLoader;

/** The exam check step: checks the whole folder through {@link ExamSourceReader#check} and lists every problem. */
public final class ExamCheckModel {

    private final AdminSession session;
    private final StringProperty folder = new SimpleStringProperty("");
    private final StringProperty summary = new SimpleStringProperty("Choose the exam folder (the one holding exam.yaml), then check it.");
    private final ObservableList<Problem> problems = FXCollections.observableArrayList();

    private final ObservableList<String> taskIds = FXCollections.observableArrayList();
    private final ObservableList<String> conditionIds = FXCollections.observableArrayList();
    private final StringProperty previewTask = new SimpleStringProperty();
    private final StringProperty previewCondition = new SimpleStringProperty();
    private final StringProperty previewMessage = new SimpleStringProperty("");

    /** A preview ready to show: the practice load of the preview bundle and what it shows. */
    public record Preview(PracticeLoad load, String taskId, String conditionId) {
    }

    public ExamCheckModel(AdminSession session) {
        this.session = session;
        session.exam().addListener((o, was, exam) -> {
            taskIds.setAll(exam == null ? List.of() : exam.tasks().stream().map(ExamSource.Task::id).toList());
            conditionIds.setAll(exam == null ? List.of() : exam.conditions().stream().map(ExamSource.Condition::id).toList());
            previewTask.set(taskIds.isEmpty() ? null : taskIds.get(0));
            previewCondition.set(conditionIds.isEmpty() ? null : conditionIds.get(0));
        });
    }

    public ObservableList<String> taskIds() {
        return taskIds;
    }

    public ObservableList<String> conditionIds() {
        return conditionIds;
    }

    public StringProperty previewTask() {
        return previewTask;
    }

    public StringProperty previewCondition() {
        return previewCondition;
    }

    public StringProperty previewMessage() {
        return previewMessage;
    }

    /**
     * Builds the preview bundle of the chosen task and condition (as {@code inkgate-admin preview})
     * in a private temporary folder, deleted when the program ends, and opens it as practice.
     */
    public Optional<Preview> preview() {
        ExamSource exam = session.exam().get();
        if (exam == null || previewTask.get() == null) {
            previewMessage.set("Check the exam folder first; the preview is built from a folder without problems.");
            return Optional.empty();
        }
        try {
            Path folder = Files.createTempDirectory("inkgate-preview-");
            Path file = folder.resolve("preview.inkexam");
            folder.toFile().deleteOnExit();
            file.toFile().deleteOnExit();
            PreviewBundle.Built built = PreviewBundle.build(exam, previewTask.get(), previewCondition.get(), file);
            previewMessage.set("Preview window opened: task " + built.task().id() + " under " + built.condition().id()
                    + ". It is a preview, not a locked sitting.");
            return Optional.of(new Preview(new PracticeLoader().load(file), built.task().id(), built.condition().id()));
        } catch (Exception e) {
            previewMessage.set("No preview. " + Messages.of(e));
            return Optional.empty();
        }
    }

    public StringProperty folder() {
        return folder;
    }

    public StringProperty summary() {
        return summary;
    }

    public ObservableList<Problem> problems() {
        return problems;
    }

    /** Checks the folder; the session keeps the exam only when it has no problems. */
    public void check() {
        Path dir = Fields.path(folder.get());
        problems.clear();
        session.exam().set(null);
        if (dir == null) {
            summary.set("No folder chosen. Choose the exam folder (the one holding exam.yaml).");
            return;
        }
        session.examFolder().set(dir);
        List<Problem> found = new ArrayList<>();
        Optional<ExamSource> exam = ExamSourceReader.check(dir, found);
        problems.setAll(found);
        if (!found.isEmpty()) {
            summary.set(found.size() + (found.size() == 1 ? " problem" : " problems") + " in " + dir
                    + ". Each row names the file, line, column and field and says how to fix it; fix them all and"
                    + " check again. The later steps need a folder without problems.");
            return;
        }
        ExamSource e = exam.orElseThrow();
        session.exam().set(e);
        summary.set("No problems found. Exam " + e.examId() + ", \"" + e.title() + "\" (" + e.language() + ")"
                + (e.practice() ? ", practice" : "") + ": " + e.tasks().size() + " tasks, " + e.conditions().size()
                + " conditions, " + FormDesigner.forms(e).size() + " forms (" + e.design().kind().word() + "), "
                + e.packs().size() + " packs, " + (e.rubric() == null ? "no rubric" : e.rubric().criteria().size()
                + " rubric criteria") + ".");
    }
}
