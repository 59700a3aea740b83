package org.inkgate.admin.gui.missing;

import java.util.List;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.inkgate.admin.core.collection.MissingReport;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.StoreField;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.admin.gui.Messages;

/** The missing-response step: {@link MissingReport} per exam in the store, as {@code inkgate-admin missing}. */
public final class MissingModel {

    static final String CAUTION = "This report cannot tell why a response is missing (absence, a package not yet"
            + " collected, a machine failure). Look for the client's local copy before concluding, and follow your"
            + " regulations.";

    private final AdminSession session;
    private final StringProperty store = new SimpleStringProperty("");
    private final StringProperty report = new SimpleStringProperty("");

    public MissingModel(AdminSession session) {
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

    public StringProperty report() {
        return report;
    }

    /** Reads the store and writes the report text. */
    public void show() {
        StoreLocation at;
        try {
            at = StoreField.existing(store.get(), session.storePasswordFile().get());
        } catch (StoreException e) {
            report.set(e.getMessage());
            return;
        }
        try (ResultsStore s = Stores.openResultsForReading(at)) {
            StringBuilder b = new StringBuilder();
            List<String> exams = s.examIds();
            if (exams.isEmpty()) {
                b.append("The store holds no exam yet. Collect first (step 4).");
            }
            for (String examId : exams) {
                append(b, MissingReport.of(s, examId));
            }
            report.set(b.toString().strip());
        } catch (Exception e) {
            report.set(Messages.of(e));
        }
    }

    private static void append(StringBuilder b, MissingReport r) {
        b.append("Exam ").append(r.examId()).append(" (").append(r.rosterSize()).append(" on the roster):\n");
        if (r.missingCount() == 0 && r.withoutForm().isEmpty()) {
            b.append("  None missing: every candidate on the roster has a response to every task of their form.\n\n");
            return;
        }
        r.byForm().forEach((form, list) -> {
            b.append("  Form ").append(form).append(": ").append(list.isEmpty() ? "none missing" : list.size() + " missing")
                    .append('\n');
            list.forEach(m -> b.append("    candidate ").append(m.candidateNumber())
                    .append(m.level() == null ? "" : " (level " + m.level() + ")")
                    .append(m.taskId() == null ? ": no response package" : ": no response to task " + m.taskId())
                    .append('\n'));
        });
        if (!r.withoutForm().isEmpty()) {
            b.append("  On the roster without a form in the bundle: ").append(r.withoutForm()).append('\n');
        }
        b.append('\n').append(CAUTION).append("\n\n");
    }
}
