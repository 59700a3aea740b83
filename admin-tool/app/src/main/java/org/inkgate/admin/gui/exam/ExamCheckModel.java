package org.inkgate.admin.gui.exam;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.Problem;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.Fields;

/** The exam check step: checks the whole folder through {@link ExamSourceReader#check} and lists every problem. */
public final class ExamCheckModel {

    private final AdminSession session;
    private final StringProperty folder = new SimpleStringProperty("");
    private final StringProperty summary = new SimpleStringProperty("Choose the exam folder (the one holding exam.yaml), then check it.");
    private final ObservableList<Problem> problems = FXCollections.observableArrayList();

    public ExamCheckModel(AdminSession session) {
        this.session = session;
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
