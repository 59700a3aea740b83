package org.inkgate.admin.gui.forms;

import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.List;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.AssignmentCounts;
import org.inkgate.admin.core.forms.AssignmentTable;
import org.inkgate.admin.core.forms.DesignSummary;
import org.inkgate.admin.core.forms.FormAssignment;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.roster.RosterSummary;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.gui.AdminSession;
import org.inkgate.admin.gui.Fields;
import org.inkgate.admin.gui.Messages;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;

/**
 * The forms step: the generated forms, the roster check and the seeded, stratified assignment
 * through the same core calls as {@code inkgate-admin forms --roster --seed --out}.
 */
public final class FormsModel {

    private final AdminSession session;
    private final StringProperty roster = new SimpleStringProperty("");
    private final StringProperty seed = new SimpleStringProperty("");
    private final StringProperty out = new SimpleStringProperty("");
    private final BooleanProperty replace = new SimpleBooleanProperty(false);
    private final StringProperty formsText = new SimpleStringProperty("");
    private final StringProperty result = new SimpleStringProperty("");
    private final ObjectProperty<AssignmentCounts> counts = new SimpleObjectProperty<>();
    private final ObservableList<String> formIds = FXCollections.observableArrayList();
    private final ObservableList<Assignment.Row> rows = FXCollections.observableArrayList();
    private final ObservableList<String> balance = FXCollections.observableArrayList();

    public FormsModel(AdminSession session) {
        this.session = session;
        session.exam().addListener((o, was, exam) -> showForms(exam));
    }

    public StringProperty roster() {
        return roster;
    }

    public StringProperty seed() {
        return seed;
    }

    public StringProperty out() {
        return out;
    }

    /** The test owner's explicit choice to replace an existing table at {@link #out()}; cleared after each use. */
    public BooleanProperty replace() {
        return replace;
    }

    public StringProperty formsText() {
        return formsText;
    }

    public StringProperty result() {
        return result;
    }

    public ObjectProperty<AssignmentCounts> counts() {
        return counts;
    }

    public ObservableList<String> formIds() {
        return formIds;
    }

    /** The design's balance lines for the last assignment (the same lines {@code forms} prints). */
    public ObservableList<String> balance() {
        return balance;
    }

    public ObservableList<Assignment.Row> rows() {
        return rows;
    }

    private void showForms(ExamSource exam) {
        if (exam == null) {
            formsText.set("Check the exam folder first (step 1).");
            formIds.clear();
            return;
        }
        List<FormSpec> forms = FormDesigner.forms(exam);
        StringBuilder b = new StringBuilder(String.join("\n", DesignSummary.lines(exam, forms)));
        b.append('\n').append(forms.size()).append(" forms (").append(exam.design().kind().word()).append("):");
        for (FormSpec f : forms) {
            b.append("\n  ").append(f.id()).append(':');
            for (FormSlot s : f.slots()) {
                b.append("   ").append(s.taskId()).append(" [").append(s.conditionId()).append(']');
            }
        }
        formsText.set(b.toString());
        formIds.setAll(forms.stream().map(FormSpec::id).toList());
        if (out.get().isBlank()) {
            out.set(session.besideExam("assignment.csv").toString());
        }
    }

    /** Reads the roster, assigns forms with the seed (a new one when blank) and writes the table. */
    public void assign() {
        ExamSource exam = session.exam().get();
        counts.set(null);
        balance.clear();
        rows.clear();
        if (exam == null) {
            result.set("Check the exam folder first (step 1): forms come from a folder without problems.");
            return;
        }
        try {
            Path rosterFile = Fields.path(roster.get());
            if (rosterFile == null) {
                result.set("Name the roster CSV (candidate_number, level, ...).");
                return;
            }
            long usedSeed;
            if (seed.get().isBlank()) {
                usedSeed = new SecureRandom().nextLong();
                seed.set(Long.toString(usedSeed));
            } else {
                try {
                    usedSeed = Long.parseLong(seed.get().strip());
                } catch (NumberFormatException e) {
                    result.set("The seed \"" + seed.get() + "\" is not a whole number. Give a whole number, or leave it"
                            + " blank to draw a new one.");
                    return;
                }
            }
            List<RosterCandidate> candidates = RosterReader.read(rosterFile);
            List<FormSpec> forms = FormDesigner.forms(exam);
            FormAssignment.Result assigned = FormAssignment.assign(exam, forms, candidates, usedSeed);
            Assignment a = assigned.assignment();
            Path table = Fields.path(out.get());
            if (table != null) {
                try {
                    AssignmentTable.write(a, table, replace.get());
                } catch (AssignmentTable.ExistsException e) {
                    result.set(e.getMessage() + "\nNothing was saved; the seed drawn now was " + usedSeed + ".");
                    return;
                } finally {
                    replace.set(false);
                }
                session.assignment().set(table);
            }
            session.roster().set(rosterFile);
            balance.setAll(assigned.balance());
            counts.set(assigned.counts());
            rows.setAll(a.rows());
            RosterSummary summary = RosterSummary.of(candidates);
            result.set("Roster: " + summary.candidates() + " candidates, per level " + summary.perLevel()
                    + "; accommodations: extra time " + summary.extraTime() + ", large print " + summary.largePrint()
                    + ", high contrast " + summary.highContrast() + (summary.personalFields().isEmpty() ? ""
                    : "; personal fields " + summary.personalFields() + " stay in the results store, never in bundles"
                    + " or rater exports") + ".\n"
                    + a.rows().size() + " candidates assigned with seed " + usedSeed + " (the same seed and roster give"
                    + " the same assignment)." + (table == null ? " Not saved: name a file to save the table."
                    : " Table saved to " + table + "."));
        } catch (Exception e) {
            result.set(Messages.of(e));
        }
    }
}
