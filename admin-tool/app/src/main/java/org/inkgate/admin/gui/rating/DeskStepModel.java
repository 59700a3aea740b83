package org.inkgate.admin.gui.rating;

import java.util.List;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.stage.Stage;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.StoreField;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.gui.Work;

/** The admin window's rating step: opens the rating desk in its own window over the chosen results store. */
public final class DeskStepModel {

    private final AdminSession session;
    private final StringProperty store = new SimpleStringProperty("");
    private final StringProperty exam = new SimpleStringProperty("");
    private final StringProperty result = new SimpleStringProperty("");

    public DeskStepModel(AdminSession session) {
        this.session = session;
        StoreField.link(store, session.store());
    }

    /** The password file of a PostgreSQL store, shared by the steps. */
    public StringProperty storePasswordFile() {
        return session.storePasswordFile();
    }

    public StringProperty store() {
        return store;
    }

    /** The exam id; may stay empty when the store holds one exam. */
    public StringProperty exam() {
        return exam;
    }

    public StringProperty result() {
        return result;
    }

    /** Opens the store off the JavaFX thread, then the desk in a new window; the store closes with it. */
    public void open() {
        String examId = exam.get() == null || exam.get().isBlank() ? null : exam.get().strip();
        StoreLocation file;
        try {
            file = StoreField.existing(store.get(), session.storePasswordFile().get());
        } catch (StoreException e) {
            result.set(e.getMessage());
            return;
        }
        Work work = session.work();
        work.run("Opening the rating desk", p -> open(file, examId), opened -> {
            Stage stage = new Stage();
            DeskWindow.show(stage, new DeskModel(opened), () -> close(opened));
            result.set("The rating desk is open in its own window for exam " + opened.examId() + ". Raters sign in there;"
                    + " closing that window ends the session.");
        }, failure -> result.set("The rating desk did not open. " + failure));
    }

    private static RatingStore open(StoreLocation file, String examId) throws RatingException {
        String id = examId;
        if (id == null) {
            List<String> exams = Stores.exams(file);
            if (exams.size() != 1) {
                throw new RatingException("the store holds " + exams.size() + " exams " + exams + "; type the exam id");
            }
            id = exams.get(0);
        }
        RatingStore s = Stores.openRating(file, id);
        if (s.raters().isEmpty()) {
            s.close();
            throw new RatingException("exam " + id + " has no raters yet; add them and assign the responses first"
                    + " (inkgate-admin rate raters add, rate assign; see the test owner guide)");
        }
        return s;
    }

    private static void close(RatingStore s) {
        try {
            s.close();
        } catch (RatingException e) {
            // every draft and rating was committed when its call returned; closing only ends the connection
        }
    }
}
